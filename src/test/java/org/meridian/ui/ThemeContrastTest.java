package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.Color;
import org.junit.jupiter.api.Test;

class ThemeContrastTest {
    @Test
    void contrastRatiosMatchTheWcagDefinition() {
        // WCAG 2.1, definition of contrast ratio: black on white is 21:1
        assertThat(Theme.contrast(Color.BLACK, Color.WHITE)).isCloseTo(21.0, within(1e-9));
        // from memory: #767676 on white is the often-quoted 4.54:1, the darkest grey passing AA
        assertThat(Theme.contrast(new Color(0x767676), Color.WHITE)).isCloseTo(4.54, within(0.01));
        // WCAG 2.1 relative luminance: pure green alone weighs 0.7152
        assertThat(Theme.luminance(new Color(0x00ff00))).isCloseTo(0.7152, within(1e-9));
    }

    @Test
    void stateNumbersAreDarkOnYellowAndWhiteOnBlueInBothThemes() {
        for (Theme t : Theme.values()) {
            for (int i = 0; i < 8; i++) {
                Color fill = t.wave(i);
                Color ink = Theme.inkOn(fill);
                // common practice: WCAG AA asks 3:1 for large or bold text
                assertThat(Theme.contrast(fill, ink)).as("%s wave %d", t, i).isGreaterThanOrEqualTo(3.0);
            }
        }
        assertThat(Theme.inkOn(new Color(0xf0e442))).isNotEqualTo(Color.WHITE);
        assertThat(Theme.inkOn(new Color(0x0072b2))).isEqualTo(Color.WHITE);
    }
}
