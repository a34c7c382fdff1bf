package org.meridian.figure.spec;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.core.BadInputException;

class SpecFilesTest {
    static final String MINIMAL = """
            {
              "study": "study",
              "conditions": [{"wave": "frequent"}, {"wave": "rare"}, {"wave": "rare - frequent"}],
              "rows": [
                {"panels": [{"type": "waveforms", "channels": "Cz", "legend": true}]},
                {"panels": [
                  {"type": "map-strip", "condition": "rare", "times_ms": [300, 400]},
                  {"type": "colour-bar"}
                ]}
              ]
            }
            """;

    private static String error(String json) {
        try {
            SpecFiles.parse(json, "fig.json");
        } catch (BadInputException e) {
            return e.getMessage();
        }
        throw new AssertionError("expected an error for " + json);
    }

    @Test
    void leftOutSettingsTakeTheJournalDefaults() {
        FigureSpec spec = SpecFiles.parse(MINIMAL, "fig.json");
        assertThat(spec.size().width().mm()).isEqualTo(175);
        assertThat(spec.font().sizePt()).isEqualTo(7);
        assertThat(spec.font().labelPt()).isEqualTo(8);
        assertThat(spec.lines().wavePt()).isGreaterThanOrEqualTo(0.5);
        assertThat(spec.lines().axisPt()).isGreaterThanOrEqualTo(0.5);
        assertThat(spec.polarity()).isEqualTo(Polarity.POSITIVE_UP);
        assertThat(spec.intervals().kind()).isEqualTo(IntervalKind.WITHIN_PARTICIPANTS);
        assertThat(spec.intervals().level()).isEqualTo(0.95);
        assertThat(spec.maps().colourScale()).isEqualTo("diverging");
        assertThat(spec.conditions()).extracting(ShownCondition::colour)
                .containsExactly("#0072B2", "#D55E00", "#009E73");
        assertThat(spec.conditions()).extracting(ShownCondition::dashed).containsExactly(false, false, true);
        assertThat(spec.panels()).hasSize(3);
    }

    @Test
    void writingAndReadingGivesTheSameSpec(@TempDir Path dir) throws Exception {
        FigureSpec spec = SpecFiles.parse(MINIMAL, "fig.json");
        Path file = dir.resolve("fig.json");
        SpecFiles.write(spec, file);
        String text = Files.readString(file);
        assertThat(text).contains("\"width_mm\" : \"two-column\"").contains("\"type\" : \"map-strip\"").endsWith("}\n");
        assertThat(SpecFiles.read(file)).isEqualTo(spec);
        assertThat(SpecFiles.toJson(SpecFiles.read(file))).isEqualTo(text);
    }

    @Test
    void customWidthIsAPlainNumber() {
        FigureSpec spec = SpecFiles.parse(MINIMAL.replace("\"study\": \"study\",",
                "\"study\": \"study\", \"size\": {\"width_mm\": 120, \"height_mm\": 80},"), "fig.json");
        assertThat(spec.size().width()).isEqualTo(FigureWidth.mm(120));
        assertThat(SpecFiles.toJson(spec)).contains("\"width_mm\" : 120.0");
    }

    @Test
    void anUnknownFieldIsOneLineNamingFileLineAndPath() {
        String message = error(MINIMAL.replace("\"legend\": true", "\"legnd\": true"));
        assertThat(message).doesNotContain("\n")
                .startsWith("fig.json line 5 column")
                .contains("(rows[0].panels[0].legnd)")
                .contains("unknown field \"legnd\"")
                .contains("legend");
    }

    @Test
    void badValuesAreOneLineNamingThePath() {
        assertThat(error(MINIMAL.replace("\"study\": \"study\",", "\"study\": \"study\", \"polarity\": \"up\",")))
                .doesNotContain("\n").startsWith("fig.json line 2").contains("(polarity)")
                .endsWith("\"up\" is not one of positive-up, negative-up");
        assertThat(error(MINIMAL.replace("\"study\": \"study\",", "\"study\": \"study\", \"font\": {\"size_pt\": 40},")))
                .doesNotContain("\n").contains("(font)").endsWith("font.size_pt must be 4 to 24 pt, got 40");
        assertThat(error(MINIMAL.replace("\"study\": \"study\",", "\"study\": \"study\", \"font\": {\"size_pt\": \"7\"},")))
                .doesNotContain("\n").contains("(font.size_pt)");
        assertThat(error(MINIMAL.replace("\"type\": \"map-strip\"", "\"type\": \"mapstrip\"")))
                .doesNotContain("\n").contains("(rows[1].panels[0]")
                .contains("no panel type \"mapstrip\" (types: waveforms, map-strip, colour-bar, span-trace)");
        assertThat(error(MINIMAL.replace("\"times_ms\": [300, 400]", "\"times_ms\": [300, 400], \"windows_ms\": [[1, 2]]")))
                .doesNotContain("\n").contains("(rows[1].panels[0])")
                .endsWith("a map strip needs either times_ms or windows_ms (not both)");
        assertThat(error(MINIMAL.replace("\"study\": \"study\",", "\"study\": \"study\", \"size\": {\"width_mm\": \"wide\"},")))
                .doesNotContain("\n").contains("(size.width_mm)").contains("one-column (85 mm) or two-column (175 mm)");
        assertThat(error(MINIMAL.replace("{\"wave\": \"rare\"}", "{\"wave\": \"rare\", \"colour\": \"red\"}")))
                .doesNotContain("\n").contains("(conditions[1])").endsWith("colour must be a colour written #RRGGBB, got \"red\"");
        assertThat(error("{\"study\": \"s\", \"study\": \"t\"}")).doesNotContain("\n").contains("Duplicate field 'study'");
        assertThat(error(MINIMAL + " {}")).doesNotContain("\n").startsWith("fig.json line 1")
                .endsWith("there is more text after the end of the spec");
        assertThat(error("{\"study\": \"s\"")).doesNotContain("\n").startsWith("fig.json line 1");
    }

    @Test
    void aPanelMayOnlyPickTheFiguresConditions() {
        assertThat(error(MINIMAL.replace("\"legend\": true", "\"conditions\": [\"common\"]")))
                .doesNotContain("\n")
                .endsWith("rows[0].panels[0].conditions: \"common\" is not one of the figure's conditions "
                        + "(frequent, rare, rare - frequent)");
    }

    @Test
    void aMissingFileIsNamed(@TempDir Path dir) {
        assertThatThrownBy(() -> SpecFiles.read(dir.resolve("none.json"))).isInstanceOf(BadInputException.class)
                .hasMessageEndingWith("none.json: no such file");
    }

    @Test
    void contrastsAreToldFromConditionNames() {
        assertThat(ShownCondition.looksLikeContrast("rare - frequent")).isTrue();
        assertThat(ShownCondition.looksLikeContrast("0.5*a + 0.5*b")).isTrue();
        assertThat(ShownCondition.looksLikeContrast("'go-left'")).isFalse();
        assertThat(ShownCondition.looksLikeContrast("rare")).isFalse();
        assertThat(List.of(FigureWidth.ONE_COLUMN.mm(), FigureWidth.TWO_COLUMN.mm())).containsExactly(85.0, 175.0);
    }
}
