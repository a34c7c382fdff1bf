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
        // DESIGN §3 (nose up, left on the left) with the centred dipole V ∝ r·d (DESIGN §8):
        // warm (red > blue) on the left, cool on the right
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
        CliRun late = CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "900", "-o", out);
        assertThat(late.err().strip()).isEqualTo("error: time 900 ms is outside the data (-100 to 56 ms)");
        CliRun both = CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "0", "--windows", "0:10", "-o", out);
        assertThat(both.exitCode()).isEqualTo(2);
        assertThat(both.err()).startsWith("error: ");
        CliRun window = CliRun.of("maps", study.toString(), "--condition", "rare", "--windows", "10", "-o", out);
        assertThat(window.err().strip()).isEqualTo("error: option --windows: \"10\" is not START:END in ms");
        CliRun gif = CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "0", "-o", dir.resolve("x.gif").toString());
        assertThat(gif.err().strip()).endsWith("x.gif: the figure must be a .svg, .pdf, .png or .tiff file");
        CliRun scale = CliRun.of("maps", study.toString(), "--condition", "rare", "--times", "0", "--scale", "wide", "-o", out);
        assertThat(scale.err().strip()).isEqualTo("error: colour scale limit \"wide\" is not auto or ±X (e.g. ±5)");
        assertThat(Files.exists(dir.resolve("x.png"))).isFalse();
    }
}
