package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.spline.TestFields;

class MapsCommandTest {
    @TempDir
    Path dir;
    Path study;

    @BeforeEach
    void writeStudy() {
        // a dipole toward the left ear: positive on the left
        study = SplineCommandFixture.write(TestFields.dipolar(5, -1, 0, 0), dir.resolve("study"));
    }

    @Test
    void writesAPngStripWithItsPositivePoleOnTheLeft() throws Exception {
        Path png = dir.resolve("maps.png");
        CliRun r = CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "0,50",
                "--scale", "±10", "--extent", "head", "--no-contours", "--dpi", "100", "-o", png.toString());
        assertThat(r.err()).isEmpty();
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains("maps: 2").contains("quantity: µV").contains("limits: \u221210 to 10")
                .contains("left_out: VEOG (no position)");
        BufferedImage image = ImageIO.read(png.toFile());
        // the second map (50 ms, near full amplitude) fills the middle band of the strip; its
        // left and right quarters along the mid-height line
        int y = (int) (image.getHeight() * 0.58);
        int mapLeft = (int) (image.getWidth() * (1.06 / 2.56));
        int side = (int) (image.getWidth() / 2.56);
        int left = image.getRGB(mapLeft + side / 4, y);
        int right = image.getRGB(mapLeft + 3 * side / 4, y);
        // centred dipole in a sphere: V = 3 p cosθ / (4πσR²) (bioelectric field textbook), so the
        // potential is positive on the side the dipole points to; common practice draws maps
        // nose up with left on the left: warm (red > blue) on the left, cool on the right
        assertThat((left >> 16) & 0xff).isGreaterThan((left & 0xff) + 40);
        assertThat(right & 0xff).isGreaterThan(((right >> 16) & 0xff) + 40);
    }

    @Test
    void writesSvgAndPdfOfWindowMeansAndCsd() throws Exception {
        Path svg = dir.resolve("csd.svg");
        CliRun r = CliRun.of("maps", study.toString(), "--condition", "common", "--windows", "0:20,20:50",
                "--csd", "--colour-scale", "blue-yellow", "--labels", "--highlight", "Cz,Pz", "-o", svg.toString());
        assertThat(r.err()).isEmpty();
        assertThat(r.out()).contains("quantity: CSD (µV/m²)");
        assertThat(Files.readString(svg, StandardCharsets.UTF_8)).contains("<svg").contains("CSD (µV/m²)")
                .contains("0–20 ms").contains("20–50 ms");
        Path pdf = dir.resolve("maps.pdf");
        assertThat(CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "20", "-o", pdf.toString())
                .exitCode()).isZero();
        assertThat(Files.readAllBytes(pdf)).startsWith("%PDF-".getBytes(StandardCharsets.ISO_8859_1));
    }

    @Test
    void mapsAContrastExpression() {
        // the fixture's rare condition is twice its common one, so rare - common maps like common
        // (linearity of the grand average, common practice)
        String png = dir.resolve("diff.png").toString();
        CliRun diff = CliRun.of("maps", study.toString(), "--condition", "rare - common", "--times", "0,50", "-o", png);
        CliRun common = CliRun.of("maps", study.toString(), "--condition", "common", "--times", "0,50", "-o", png);
        assertThat(diff.exitCode()).isZero();
        assertThat(diff.out()).contains("condition: rare - common");
        assertThat(limits(diff.out())).isEqualTo(limits(common.out()));
    }

    private static String limits(String out) {
        return out.lines().filter(l -> l.startsWith("limits:")).findFirst().orElseThrow();
    }

    @Test
    void badRequestsAreOneLineErrors() {
        String out = dir.resolve("x.png").toString();
        CliRun noCondition = CliRun.of("maps", study.toString(), "--condition", "odd", "--times", "0", "-o", out);
        assertThat(noCondition.exitCode()).isEqualTo(2);
        assertThat(noCondition.err().strip()).startsWith("error: option --condition: ")
                .contains("no condition \"odd\"");
        CliRun both = CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "0", "--windows", "0:10", "-o", out);
        assertThat(both.exitCode()).isEqualTo(2);
        assertThat(both.err()).startsWith("error: ");
        CliRun gif = CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "0", "-o", dir.resolve("x.gif").toString());
        assertThat(gif.err().strip()).endsWith("x.gif: the figure must be a .svg, .pdf, .png or .tiff file");
        assertThat(Files.exists(dir.resolve("x.png"))).isFalse();
    }

    /** The one stderr line of a maps run on the fixture at 0 ms with extra options. */
    private String errorWith(String... options) {
        java.util.List<String> args = new java.util.ArrayList<>(java.util.List.of("maps", study.toString(),
                "--condition", "rare"));
        if (java.util.Arrays.stream(options).noneMatch(o -> o.equals("--times") || o.equals("--windows"))) {
            args.addAll(java.util.List.of("--times", "0"));
        }
        args.addAll(java.util.List.of(options));
        args.addAll(java.util.List.of("-o", dir.resolve("x.png").toString()));
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertThat(r.exitCode()).as(String.join(" ", options)).isEqualTo(2);
        assertThat(r.err().lines().count()).as(r.err()).isEqualTo(1);
        assertThat(Files.exists(dir.resolve("x.png"))).isFalse();
        return r.err().strip();
    }

    @Test
    void everyBadOptionIsNamedInItsError() {
        // DESIGN §9: one line "error: …" naming the option at fault
        assertThat(errorWith("--times", "900"))
                .isEqualTo("error: option --times: time 900 ms is outside the data (-100 to 56 ms)");
        assertThat(errorWith("--times", "abc")).isEqualTo("error: option --times: \"abc\" is not a number of ms");
        assertThat(errorWith("--windows", "10")).isEqualTo("error: option --windows: \"10\" is not START:END in ms");
        assertThat(errorWith("--windows", "30:30")).startsWith("error: option --windows: a map window must run");
        assertThat(errorWith("--windows", "0:900")).startsWith("error: option --windows: window 0:900 ms reaches beyond");
        assertThat(errorWith("--scale", "wide")).isEqualTo(
                "error: option --scale: colour limits \"wide\" are not auto, ±X (e.g. ±5) or LOWER:UPPER (e.g. -2:8)");
        assertThat(errorWith("--scale=-5")).startsWith("error: option --scale: a symmetric colour scale needs a positive limit");
        assertThat(errorWith("--scale", "8:-2")).startsWith("error: option --scale: colour limits \"8:-2\" must run from");
        assertThat(errorWith("--scale", "1:NaN")).startsWith("error: option --scale: colour limits \"1:NaN\" are not");
        assertThat(errorWith("--colour-scale", "rainbow")).startsWith("error: option --colour-scale: no colour scale \"rainbow\"");
        assertThat(errorWith("--extent", "foo")).startsWith("error: option --extent: map extent \"foo\" is not");
        assertThat(errorWith("--extent", "electrodes:7")).startsWith("error: option --extent: the map margin must be");
        assertThat(errorWith("--width-mm", "0")).startsWith("error: option --width-mm: ").contains("20 to 500 mm");
        assertThat(errorWith("--resolution", "8")).isEqualTo("error: option --resolution: must be from 16 to 2048, got 8");
    }

    @Test
    void highlightedLabelsMustBeOnTheMaps() {
        assertThat(errorWith("--highlight", "Cz,Fp1x")).isEqualTo(
                "error: option --highlight: no channel \"Fp1x\" on the maps; did you mean Fp1?");
        assertThat(errorWith("--highlight", "Xyzzy")).isEqualTo("error: option --highlight: no channel \"Xyzzy\" on the maps");
        // a mastoid reference is no misspelt scalp site (common practice)
        assertThat(errorWith("--highlight", "M1")).isEqualTo("error: option --highlight: no channel \"M1\" on the maps");
        assertThat(errorWith("--highlight", "VEOG")).isEqualTo(
                "error: option --highlight: channel \"VEOG\" has no position, so it is not on the maps");
    }

    @Test
    void fixedAsymmetricLimitsAreKept() {
        CliRun r = CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "0,50", "--scale", "-2:8",
                "--dpi", "100", "-o", dir.resolve("a.png").toString());
        assertThat(r.err()).isEmpty();
        assertThat(r.out()).contains("limits: \u22122 to 8");
    }
}
