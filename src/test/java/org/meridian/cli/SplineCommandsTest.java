package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.HashMap;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.Electrode;
import org.meridian.core.Study;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.io.StudyLoader;
import org.meridian.spline.TestFields;
import org.meridian.spline.TestFields.Field;

/** The csd and repair commands, end to end through the study reader and writer. */
class SplineCommandsTest {
    private static final double R = 0.1;

    @TempDir
    Path dir;

    /** Every file under a folder with its bytes, to prove the input is left untouched. */
    private static Map<Path, byte[]> snapshot(Path folder) throws Exception {
        Map<Path, byte[]> out = new HashMap<>();
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path p : files.filter(Files::isRegularFile).toList()) {
                out.put(folder.relativize(p), Files.readAllBytes(p));
            }
        }
        return out;
    }

    @Test
    void csdWritesAStudyInMicrovoltsPerSquareMetreWithoutUnpositionedChannels() throws Exception {
        Field xy = (x, y, z) -> 8 * x * y;
        Path in = SplineCommandFixture.write(xy, dir.resolve("in"));
        Map<Path, byte[]> before = snapshot(in);
        Path out = dir.resolve("csd");
        CliRun r = CliRun.of("csd", in.toString(), "-o", out.toString(), "--lambda", "0");
        assertThat(r.err()).isEmpty();
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains("unit: µV/m²").contains("left_out: VEOG (no position)")
                .contains("spline: m=4 lambda=0.0 terms=50 radius_m=0.1");
        Study csd = StudyLoader.load(out);
        assertThat(csd.unit()).isEqualTo(Unit.MICROVOLT_PER_SQUARE_METRE);
        assertThat(csd.channelLabels()).doesNotContain("VEOG").hasSize(SplineCommandFixture.TEN_TEN.size());
        assertThat(csd.trials(0, 0).getAsInt()).isEqualTo(30);
        Waveforms w = csd.waveforms("p02", "rare");
        Electrode c3 = SplineCommandFixture.electrode("C3");
        int s = 30;
        // 8xy is a degree-2 harmonic: CSD = +2·3·V/R² (Laplace–Beltrami eigenvalue identity), within 1 %
        double expected = 6 * xy.at(c3) * 2 * SplineCommandFixture.course(s) / (R * R);
        double scale = 6 * 8 * 2 / (R * R);
        assertThat((double) w.value(w.requireIndex("C3"), s)).isCloseTo(expected, within(0.01 * scale));
        assertThat(snapshot(in)).containsOnlyKeys(before.keySet());
        before.forEach((p, bytes) -> assertThat(snapshot0(in, p)).isEqualTo(bytes));
    }

    private static byte[] snapshot0(Path folder, Path file) {
        try {
            return Files.readAllBytes(folder.resolve(file));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void anExistingFolderIsReplacedOnlyWithForce() throws Exception {
        Path in = SplineCommandFixture.write((x, y, z) -> z, dir.resolve("in"));
        Path out = dir.resolve("csd");
        assertThat(CliRun.of("csd", in.toString(), "-o", out.toString()).exitCode()).isZero();
        CliRun again = CliRun.of("csd", in.toString(), "-o", out.toString());
        assertThat(again.exitCode()).isEqualTo(2);
        assertThat(again.err()).startsWith("error: ").doesNotContain("Exception");
        assertThat(CliRun.of("csd", in.toString(), "-o", out.toString(), "--force").exitCode()).isZero();
        // the CSD of a CSD study makes no sense
        CliRun twice = CliRun.of("csd", out.toString(), "-o", dir.resolve("csd2").toString());
        assertThat(twice.exitCode()).isEqualTo(2);
        assertThat(twice.err()).contains("already CSD");
    }

    @Test
    void evenWithForceTheInputStudyIsNeverReplaced() throws Exception {
        Path in = SplineCommandFixture.write((x, y, z) -> z, dir.resolve("in"));
        byte[] manifest = Files.readAllBytes(in.resolve("study.tsv"));
        for (Path target : List.of(in, dir)) {
            CliRun r = CliRun.of("csd", in.toString(), "-o", target.toString(), "--force");
            assertThat(r.exitCode()).isEqualTo(2);
            assertThat(r.err()).startsWith("error: option -o: ").contains("holds an input file of the study");
            CliRun repair = CliRun.of("repair", in.resolve("study.tsv").toString(), "--channels", "C3",
                    "-o", target.toString(), "--force");
            assertThat(repair.exitCode()).isEqualTo(2);
        }
        assertThat(Files.readAllBytes(in.resolve("study.tsv"))).isEqualTo(manifest);
    }

    @Test
    void badSplineOptionsNameTheOption() throws Exception {
        Path in = SplineCommandFixture.write((x, y, z) -> z, dir.resolve("in"));
        CliRun r = CliRun.of("csd", in.toString(), "-o", dir.resolve("o").toString(), "--m", "1");
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err().strip()).isEqualTo("error: option --m: spline order m must be an integer from 2 to 10, got 1");
        CliRun lambda = CliRun.of("repair", in.toString(), "--channels", "C3", "-o", dir.resolve("o").toString(),
                "--lambda", "-1");
        assertThat(lambda.err()).startsWith("error: option --lambda: ");
        assertThat(Files.exists(dir.resolve("o"))).isFalse();
    }

    @Test
    void repairRestoresChannelsOfADegreeTwoFieldAndKeepsTheOthers() throws Exception {
        Field quadrupole = (x, y, z) -> 10 * (3 * z * z - 1) / 2 + 6 * x * y;
        Path in = SplineCommandFixture.write(quadrupole, dir.resolve("in"));
        Path out = dir.resolve("fixed");
        CliRun r = CliRun.of("repair", in.toString(), "--channels", "c3,P8", "-o", out.toString());
        assertThat(r.err()).isEmpty();
        assertThat(r.out()).contains("repaired: C3, P8").contains("from: " + (SplineCommandFixture.TEN_TEN.size() - 2)
                + " positioned channels");
        Study original = StudyLoader.load(in);
        Study fixed = StudyLoader.load(out);
        Waveforms a = original.waveforms("p01", "rare");
        Waveforms b = fixed.waveforms("p01", "rare");
        assertThat(b.labels()).isEqualTo(a.labels());
        double worst = 0;
        for (int ch = 0; ch < a.channelCount(); ch++) {
            for (int s = 0; s < a.sampleCount(); s++) {
                if (a.label(ch).equals("C3") || a.label(ch).equals("P8")) {
                    worst = Math.max(worst, Math.abs(b.value(ch, s) - a.value(ch, s)));
                } else {
                    // untouched channels are only rewritten, at the default 4 decimals (plus float rounding)
                    assertThat((double) b.value(ch, s)).isCloseTo(a.value(ch, s), within(5.1e-5));
                }
            }
        }
        // spline interpolation of a smooth field (Perrin et al., 1989): within 0.5 % of the
        // field's range (2 × 16 µV); 0.41 % reached, at P8, on the rim of the upper rows
        assertThat(worst / 32).isLessThan(0.005);
    }

    @Test
    void repairOfUnpositionedOrUnknownChannelsIsRefused() throws Exception {
        Path in = SplineCommandFixture.write(TestFields.dipolar(1, 1, 0, 0), dir.resolve("in"));
        CliRun eog = CliRun.of("repair", in.toString(), "--channels", "VEOG", "-o", dir.resolve("o").toString());
        assertThat(eog.exitCode()).isEqualTo(2);
        assertThat(eog.err().strip()).isEqualTo("error: channel VEOG has no position, so it cannot be repaired");
        CliRun unknown = CliRun.of("repair", in.toString(), "--channels", "Q9", "-o", dir.resolve("o").toString());
        assertThat(unknown.err().strip()).startsWith("error: ").endsWith("has no channel Q9 to repair");
        CliRun missing = CliRun.of("repair", in.toString(), "-o", dir.resolve("o").toString());
        assertThat(missing.exitCode()).isEqualTo(2);
        assertThat(missing.err()).contains("--channels");
    }
}
