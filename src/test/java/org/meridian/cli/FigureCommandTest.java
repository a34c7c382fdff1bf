package org.meridian.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FigureCommandTest {
    private static final String SPEC = """
            {"study": "%s",
             "size": {"width_mm": "one-column"},
             "conditions": [{"wave": "rare"}, {"wave": "frequent"}],
             "maps": {"resolution": 40},
             "rows": [
               {"panels": [{"type": "waveforms", "channels": "%s", "legend": true}]},
               {"panels": [{"type": "map-strip", "condition": "rare", "windows_ms": [[300, 400]]},
                           {"type": "colour-bar", "width": 0.4}]}
             ]}
            """;

    private static Path spec(Path dir, String channel) throws Exception {
        Path study = Path.of("samples", "two-tone-listening").toAbsolutePath();
        Path file = dir.resolve("fig.json");
        Files.writeString(file, SPEC.formatted(study.toString().replace("\\", "\\\\"), channel));
        return file;
    }

    @Test
    void rendersASpecToSvgAndSaysWhatItWrote(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("fig.svg");
        CliRun r = CliRun.of("figure", spec(dir, "Pz").toString(), "-o", out.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).contains("output: " + out).contains("format: svg").contains("size_mm: 85.0 x ")
                .contains("panels: 3");
        assertThat(Files.readString(out, StandardCharsets.UTF_8)).contains("width='85mm'").contains(">300–400 ms<");
    }

    @Test
    void theCommandAndTheLibraryGiveTheSameBytes(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("fig.svg");
        Path file = spec(dir, "Pz");
        CliRun.of("figure", file.toString(), "-o", out.toString());
        String library = org.meridian.figure.Figures.svg(org.meridian.figure.Figures.load(file));
        assertThat(Files.readString(out, StandardCharsets.UTF_8)).isEqualTo(library);
    }

    @Test
    void anUnknownChannelIsAOneLineErrorNamingIt(@TempDir Path dir) throws Exception {
        Path file = spec(dir, "Pzz");
        CliRun r = CliRun.of("figure", file.toString(), "-o", dir.resolve("f.svg").toString());
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err().strip()).doesNotContain("\n")
                .startsWith("error: " + file + ": rows[0].panels[0].channels: no channel Pzz");
        assertThat(Files.exists(dir.resolve("f.svg"))).isFalse();
    }

    @Test
    void badOptionsAreOneLineErrors(@TempDir Path dir) throws Exception {
        Path file = spec(dir, "Pz");
        CliRun dpi = CliRun.of("figure", file.toString(), "-o", dir.resolve("f.png").toString(), "--dpi", "20");
        assertThat(dpi.exitCode()).isEqualTo(2);
        assertThat(dpi.err().strip()).isEqualTo("error: option --dpi: resolution must be 72 to 2400 dpi, got 20");
        CliRun gif = CliRun.of("figure", file.toString(), "-o", dir.resolve("f.gif").toString());
        assertThat(gif.err().strip()).endsWith("f.gif: the figure must be a .svg, .pdf, .png or .tiff file");
        CliRun missing = CliRun.of("figure", dir.resolve("none.json").toString(), "-o", dir.resolve("f.svg").toString());
        assertThat(missing.err().strip()).endsWith("none.json: no such file");
    }
}
