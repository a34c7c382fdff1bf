package org.meridian.figure;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;

/**
 * Journal-ready layout at both presets: no two pieces of text touch, and all text lies on the
 * page, whatever the width — tick labels, legends, colour-bar labels and units, map times and
 * electrode names, the processing caption.
 */
class FigureTextLayoutTest {
    /** Ink boxes may graze by this much (points) without counting as a collision. */
    private static final double GRAZE_PT = 0.05;

    private static String showcase() throws IOException {
        // the README's figure, with coarse maps for speed (text does not depend on the resolution)
        return Files.readString(Path.of("docs", "showcase.json"))
                .replace("../samples/two-tone-listening", DemoFigures.STUDY.toString().replace('\\', '/'))
                .replace("\"colour_scale\": \"diverging\"", "\"colour_scale\": \"diverging\", \"resolution\": 48");
    }

    /** A harder figure: region panel with a long legend, GFP and DISS traces, a CSD strip, processing. */
    private static String crowded(String width) {
        return """
                {
                  "study": "%s",
                  "size": {"width_mm": %s},
                  "conditions": [{"wave": "rare"}, {"wave": "frequent"}, {"wave": "rare - frequent"}],
                  "processing": {"restore_reference": "REF", "reference": "average", "low_pass_hz": 30,
                                 "high_pass_hz": 0.1, "baseline": "-200:0"},
                  "maps": {"quantity": "csd", "resolution": 48},
                  "rows": [
                    {"panels": [
                      {"type": "waveforms", "channels": "P3+Pz+P4", "legend": true},
                      {"type": "span-trace", "legend": true},
                      {"type": "span-trace", "trace": "diss", "window_ms": [250, 450]}
                    ]},
                    {"panels": [
                      {"type": "map-strip", "condition": "rare", "windows_ms": [[250, 300], [300, 350], [350, 400], [400, 450]],
                       "highlight": ["FCz", "Cz", "CPz", "Pz"]},
                      {"type": "colour-bar"}
                    ]}
                  ]
                }
                """.formatted(DemoFigures.STUDY.toString().replace('\\', '/'), width);
    }

    private static List<TextRecorder.Text> texts(String json) {
        FigureSpec spec = SpecFiles.parse(json, "layout.json");
        FigureDrawing figure = Figures.draw(spec, DemoFigures.study());
        double w = figure.widthMm() * ExportFormat.PT_PER_MM;
        double h = figure.heightMm() * ExportFormat.PT_PER_MM;
        TextRecorder g = TextRecorder.page(w, h);
        figure.draw(g, new Rectangle2D.Double(0, 0, w, h));
        List<TextRecorder.Text> texts = g.texts();
        assertThat(texts).isNotEmpty();
        for (TextRecorder.Text t : texts) {
            Rectangle2D b = t.box();
            assertThat(b.getMinX() >= -GRAZE_PT && b.getMinY() >= -GRAZE_PT && b.getMaxX() <= w + GRAZE_PT
                    && b.getMaxY() <= h + GRAZE_PT).as("\"%s\" at %s lies on the %.1f × %.1f pt page", t.text(), b, w, h)
                    .isTrue();
        }
        return texts;
    }

    private static List<String> collisions(List<TextRecorder.Text> texts) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < texts.size(); i++) {
            for (int j = i + 1; j < texts.size(); j++) {
                Rectangle2D a = shrink(texts.get(i).box());
                Rectangle2D b = shrink(texts.get(j).box());
                if (a.intersects(b)) {
                    out.add("\"" + texts.get(i).text() + "\" " + a + " and \"" + texts.get(j).text() + "\" " + b);
                }
            }
        }
        return out;
    }

    private static Rectangle2D shrink(Rectangle2D r) {
        return new Rectangle2D.Double(r.getX() + GRAZE_PT, r.getY() + GRAZE_PT,
                Math.max(0, r.getWidth() - 2 * GRAZE_PT), Math.max(0, r.getHeight() - 2 * GRAZE_PT));
    }

    @ParameterizedTest
    @ValueSource(strings = {"one-column", "two-column"})
    void theShowcaseFigureKeepsItsTextApartAndOnThePage(String preset) throws IOException {
        List<TextRecorder.Text> texts = texts(showcase().replace("two-column", preset));
        // common practice (journal artwork guides): no label may overlap another
        assertThat(collisions(texts)).isEmpty();
        assertThat(texts).extracting(TextRecorder.Text::text).contains("rare", "frequent", "µV", "400 ms");
    }

    @ParameterizedTest
    @ValueSource(strings = {"85", "120", "175"})
    void aCrowdedFigureKeepsItsTextApartAndOnThePage(String widthMm) {
        List<TextRecorder.Text> texts = texts(crowded(widthMm));
        // common practice (journal artwork guides): no label may overlap another
        assertThat(collisions(texts)).isEmpty();
        String all = String.join(" ", texts.stream().map(TextRecorder.Text::text).toList());
        assertThat(all).contains("CSD (µV/m²)").contains("rare - frequent").contains("Processing:")
                .contains("zero-phase");
    }
}
