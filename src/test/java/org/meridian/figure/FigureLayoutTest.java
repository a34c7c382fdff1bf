package org.meridian.figure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.geom.Rectangle2D;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.figure.FigureLayout.Placed;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.SpecFiles;

class FigureLayoutTest {
    private static FigureLayout layout(String replaceFrom, String replaceTo) {
        FigureSpec spec = SpecFiles.parse(DemoFigures.specJson("s").replace(replaceFrom, replaceTo), "l.json");
        return FigureLayout.of(spec, FigureStyle.of(spec));
    }

    @Test
    void panelsFillTheWidthBetweenMarginsAndGaps() {
        FigureLayout l = layout("", "");
        assertThat(l.widthMm()).isEqualTo(175);
        List<Placed> top = l.placed().subList(0, 3);
        double used = 0;
        for (Placed p : top) {
            used += p.boundsMm().getWidth();
        }
        assertThat(used + 2 * FigureLayout.GAP_MM + 2 * FigureLayout.MARGIN_MM).isCloseTo(175, within(1e-9));
        assertThat(top.get(0).boundsMm().getX()).isEqualTo(FigureLayout.MARGIN_MM);
        assertThat(top.get(2).boundsMm().getMaxX()).isCloseTo(175 - FigureLayout.MARGIN_MM, within(1e-9));
        // equal shares, equal widths; a waveform row's natural height is 0.75 × panel width
        assertThat(top.get(1).boundsMm().getWidth()).isCloseTo(top.get(0).boundsMm().getWidth(), within(1e-9));
        assertThat(top.get(0).boundsMm().getHeight()).isCloseTo(0.75 * top.get(0).boundsMm().getWidth(), within(1e-9));
        Rectangle2D bar = l.placed().get(4).boundsMm();
        Rectangle2D strip = l.placed().get(3).boundsMm();
        // the colour bar's default share beside a strip of share 1
        assertThat(bar.getWidth() / strip.getWidth()).isCloseTo(0.12, within(1e-9));
        assertThat(l.heightMm()).isCloseTo(bar.getMaxY() + FigureLayout.MARGIN_MM, within(1e-9));
    }

    @Test
    void panelsAreLetteredInReadingOrderButNotTheColourBar() {
        assertThat(layout("", "").placed()).extracting(Placed::letter).containsExactly("A", "B", "C", "D", "");
        assertThat(layout("\"size\"", "\"letters\": false, \"size\"").placed()).extracting(Placed::letter)
                .containsOnly("");
    }

    @Test
    void presetsAndAFixedHeightGiveThoseSizes() {
        assertThat(layout("two-column", "one-column").widthMm()).isEqualTo(85);
        FigureLayout fixed = layout("\"two-column\"}", "\"two-column\", \"height_mm\": 120}");
        assertThat(fixed.heightMm()).isCloseTo(120, within(1e-9));
        assertThat(layout("\"two-column\"", "140").widthMm()).isEqualTo(140);
    }
}
