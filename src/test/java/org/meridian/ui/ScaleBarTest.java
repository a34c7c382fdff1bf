package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class ScaleBarTest {
    @Test
    void theBarIsARoundLengthOfAboutAQuarterOfTheRange() {
        // common practice: scale bars take the 1-2-5 series of round numbers
        assertThat(ScaleBar.roundLength(10)).isEqualTo(2);
        assertThat(ScaleBar.roundLength(8)).isEqualTo(2);
        assertThat(ScaleBar.roundLength(30)).isEqualTo(5);
        assertThat(ScaleBar.roundLength(40)).isEqualTo(10);
        assertThat(ScaleBar.roundLength(1000)).isEqualTo(200);
        assertThat(ScaleBar.roundLength(0.9)).isEqualTo(0.2, org.assertj.core.api.Assertions.within(1e-12));
        assertThat(ScaleBar.roundLength(0)).isEqualTo(1);
    }

    @Test
    void theLabelReadsWithoutNeedlessDecimals() {
        assertThat(ScaleBar.label(2, "µV")).isEqualTo("2 µV");
        assertThat(ScaleBar.label(0.5, "µV")).isEqualTo("0.5 µV");
        assertThat(ScaleBar.label(200, "ms")).isEqualTo("200 ms");
    }
}
