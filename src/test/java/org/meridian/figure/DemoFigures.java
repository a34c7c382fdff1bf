package org.meridian.figure;

import java.nio.file.Path;
import org.meridian.core.Study;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;
import org.meridian.io.StudyLoader;

/** The bundled demo study, loaded once, and a small figure spec of it for the figure tests. */
final class DemoFigures {
    static final Path STUDY = Path.of("samples", "two-tone-listening");
    private static Study demo;

    private DemoFigures() {
    }

    static synchronized Study study() {
        if (demo == null) {
            demo = StudyLoader.load(STUDY);
        }
        return demo;
    }

    /** Three waveform panels, a five-map strip (coarse maps, for speed) and the colour bar. */
    static String specJson(String study) {
        return """
                {
                  "study": "%s",
                  "size": {"width_mm": "two-column"},
                  "conditions": [{"wave": "frequent"}, {"wave": "rare"}, {"wave": "rare - frequent"}],
                  "maps": {"resolution": 48},
                  "rows": [
                    {"panels": [
                      {"type": "waveforms", "channels": "FCz"},
                      {"type": "waveforms", "channels": "Cz"},
                      {"type": "waveforms", "channels": "P3+Pz+P4", "legend": true}
                    ]},
                    {"panels": [
                      {"type": "map-strip", "condition": "rare - frequent", "times_ms": [280, 310, 340, 370, 400],
                       "highlight": ["FCz", "Cz", "Pz"]},
                      {"type": "colour-bar"}
                    ]}
                  ]
                }
                """.formatted(study.replace("\\", "\\\\"));
    }

    static FigureSpec spec() {
        return SpecFiles.parse(specJson(STUDY.toString()), "demo.json");
    }

    static FigureDrawing drawing() {
        return Figures.draw(spec(), study());
    }
}
