package org.meridian.figure;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.meridian.figure.spec.FigureWidth;

/** The showcase figure in docs/ (shown in the README) still renders from its committed spec. */
class ShowcaseTest {
    @Test
    void theCommittedShowcaseSpecRenders() throws Exception {
        Path spec = Path.of("docs", "showcase.json");
        FigureDrawing figure = Figures.load(spec);
        assertThat(figure.widthMm()).isEqualTo(FigureWidth.TWO_COLUMN.mm());
        String svg = Figures.svg(figure);
        assertThat(svg.split("class='waveform-panel'", -1)).hasSize(4);
        assertThat(svg.split("class='scalp-map'", -1)).hasSize(6);
        assertThat(Files.size(Path.of("docs", "showcase.png"))).isLessThan(300 * 1024);
    }
}
