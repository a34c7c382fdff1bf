package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.BadInputException;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

class MontageReaderTest {
    @TempDir
    Path dir;

    private Path file(String text) throws IOException {
        Path f = dir.resolve("m.tsv");
        Files.writeString(f, text);
        return f;
    }

    @Test
    void thetaPhiAreTextbookSphericalCoordinatesInDegrees() throws IOException {
        Random r = new Random(7);
        StringBuilder sb = new StringBuilder("label\ttheta\tphi\n");
        double[][] angles = new double[20][];
        for (int i = 0; i < angles.length; i++) {
            angles[i] = new double[] {1 + r.nextDouble() * 178, -180 + r.nextDouble() * 360};
            sb.append("E").append(i).append('\t').append(angles[i][0]).append('\t')
                    .append(angles[i][1]).append('\n');
        }
        Montage m = MontageReader.read(file(sb.toString()));
        for (int i = 0; i < angles.length; i++) {
            double t = Math.toRadians(angles[i][0]);
            double p = Math.toRadians(angles[i][1]);
            Electrode e = m.electrodes().get(i);
            // spherical coordinates, polar angle θ from +z, azimuth φ from +x toward +y
            // (textbook: x = sin θ cos φ, y = sin θ sin φ, z = cos θ)
            assertThat(e.x()).isCloseTo(Math.sin(t) * Math.cos(p), within(1e-12));
            assertThat(e.y()).isCloseTo(Math.sin(t) * Math.sin(p), within(1e-12));
            assertThat(e.z()).isCloseTo(Math.cos(t), within(1e-12));
        }
    }

    @Test
    void thetaPhiLandmarksFallOnTheHeadFrameAxes() throws IOException {
        Montage m = MontageReader.read(file("label theta phi\n".replace(' ', ',')
                + "Cz,0,0\nT8,90,0\nFpz,90,90\nT7,90,180\nOz,90,-90\n"));
        // DESIGN §3 head frame: Cz = +z, T8 = +x, Fpz = +y, T7 = -x, Oz = -y
        assertDirection(m, "Cz", 0, 0, 1);
        assertDirection(m, "T8", 1, 0, 0);
        assertDirection(m, "Fpz", 0, 1, 0);
        assertDirection(m, "T7", -1, 0, 0);
        assertDirection(m, "Oz", 0, -1, 0);
    }

    @Test
    void measuredPositionsAreCentredOnTheFittedSphereAndNormalised() throws IOException {
        double[] centre = {1.5, 12.0, 38.0};
        double radius = 92.0;
        Random r = new Random(3);
        StringBuilder sb = new StringBuilder("label\tx\ty\tz\n");
        double[][] dirs = new double[30][];
        for (int i = 0; i < dirs.length; i++) {
            double t = Math.toRadians(5 + r.nextDouble() * 100);
            double p = Math.toRadians(r.nextDouble() * 360);
            dirs[i] = new double[] {Math.sin(t) * Math.cos(p), Math.sin(t) * Math.sin(p), Math.cos(t)};
            sb.append(String.format(Locale.ROOT, "E%d\t%.9f\t%.9f\t%.9f%n", i,
                    centre[0] + radius * dirs[i][0], centre[1] + radius * dirs[i][1],
                    centre[2] + radius * dirs[i][2]));
        }
        Montage m = MontageReader.read(file(sb.toString()));
        assertThat(m.source()).isEqualTo(dir.resolve("m.tsv").toString());
        for (int i = 0; i < dirs.length; i++) {
            assertDirection(m, "E" + i, dirs[i][0], dirs[i][1], dirs[i][2]);
        }
    }

    @Test
    void imagingElectrodesTableIgnoresExtraColumnsAndSkipsUnknownPositions() throws IOException {
        Montage m = MontageReader.read(file("name\tx\ty\tz\ttype\tmaterial\timpedance\n"
                + "Cz\t0\t0\t0.1\tEEG\tAg/AgCl\t5\n"
                + "T8\t0.1\t0\t0\tEEG\tAg/AgCl\tn/a\n"
                + "Fpz\t0\t0.1\t0\tEEG\tAg/AgCl\t3\n"
                + "EOG1\tn/a\tn/a\tn/a\tEOG\tn/a\tn/a\n"));
        assertThat(m.labels()).containsExactly("Cz", "T8", "Fpz");
        assertDirection(m, "T8", 1, 0, 0);
    }

    @Test
    void columnsMayComeInAnyOrder() throws IOException {
        Montage m = MontageReader.read(file("z;label;y;x\n1;Cz;0;0\n0;T8;0;1\n0;Fpz;1;0\n"));
        assertThat(m.labels()).containsExactly("Cz", "T8", "Fpz");
        assertDirection(m, "Fpz", 0, 1, 0);
    }

    @Test
    void duplicateLabelNamesBothLines() throws IOException {
        Path f = file("label\ttheta\tphi\nCz\t0\t0\nT8\t90\t0\ncz\t10\t0\n");
        assertThatThrownBy(() -> MontageReader.read(f)).isInstanceOf(BadInputException.class)
                .hasMessage(f + " line 4 column 1: electrode cz appears twice (also on line 2)");
    }

    @Test
    void coincidentElectrodesAreRefused() throws IOException {
        Path f = file("label\ttheta\tphi\nCz\t0\t0\nT8\t90\t0\nT8b\t90\t0.00001\n");
        assertThatThrownBy(() -> MontageReader.read(f)).isInstanceOf(BadInputException.class)
                .hasMessage(f + " line 4: electrode T8b is at the same position as T8 (line 3)");
    }

    @Test
    void measuredElectrodesThatCoincideOnlyAfterTheFitNameBothLines() throws IOException {
        // not bit-identical, but 1e-5 mm apart on a head of radius ~100 mm: one direction
        Path f = file("label\tx\ty\tz\nCz\t0\t0\t100\nFz\t0\t70\t70\nT7\t-100\t0\t0\n"
                + "T8\t100\t0\t0\nOz\t0\t-100\t0\nFCz\t0\t70.00001\t70\n");
        assertThatThrownBy(() -> MontageReader.read(f)).isInstanceOf(BadInputException.class)
                .hasMessage(f + " line 7: electrode FCz is at the same position as Fz (line 3)");
    }

    @Test
    void headerWithoutCoordinatesIsRefused() throws IOException {
        Path f = file("label\tx\ty\nCz\t0\t0\n");
        assertThatThrownBy(() -> MontageReader.read(f)).isInstanceOf(BadInputException.class)
                .hasMessage(f + " line 1: a montage file needs the columns x, y and z, or theta and"
                        + " phi; this header has label, x, y");
    }

    private static void assertDirection(Montage m, String label, double x, double y, double z) {
        Electrode e = m.find(label).orElseThrow();
        assertThat(e.x()).as(label + " x").isCloseTo(x, within(1e-6));
        assertThat(e.y()).as(label + " y").isCloseTo(y, within(1e-6));
        assertThat(e.z()).as(label + " z").isCloseTo(z, within(1e-6));
    }
}
