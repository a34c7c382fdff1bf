package org.meridian.figure.spec;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import org.junit.jupiter.api.Test;
import org.meridian.maps.ColourSpace;
import org.meridian.maps.Dichromacy;

class ConditionPaletteTest {
    private static int rgb(String hex) {
        return Color.decode(hex).getRGB() & 0xffffff;
    }

    @Test
    void everyPairStaysDistinctForNormalAndDichromaticVision() {
        int n = ConditionPalette.COLOURS.size();
        for (int a = 0; a < n; a++) {
            for (int b = a + 1; b < n; b++) {
                int x = rgb(ConditionPalette.COLOURS.get(a));
                int y = rgb(ConditionPalette.COLOURS.get(b));
                // common practice: ΔE*ab ≥ 15 tells two colours apart at a glance
                assertThat(ColourSpace.deltaE(x, y)).isGreaterThan(15);
                for (Dichromacy d : Dichromacy.values()) {
                    // Machado, Oliveira & Fernandes (2009) simulation of protan-, deuteran- and tritanopia
                    assertThat(ColourSpace.deltaE(d.simulate(x), d.simulate(y)))
                            .as("%s: %s vs %s", d, ConditionPalette.COLOURS.get(a), ConditionPalette.COLOURS.get(b))
                            .isGreaterThan(15);
                }
            }
        }
    }

    @Test
    void theUsualPairOfConditionsDiffersStronglyForEveryone() {
        int first = rgb(ConditionPalette.colour(0));
        int second = rgb(ConditionPalette.colour(1));
        for (Dichromacy d : Dichromacy.values()) {
            // Machado et al. (2009) simulation: blue against vermilion stays far apart (ΔE*ab > 80)
            assertThat(ColourSpace.deltaE(d.simulate(first), d.simulate(second))).as("%s", d).isGreaterThan(80);
            // and they differ in lightness too, so they survive a grey-scale print
        }
        // CIELAB L*: #0072B2 ≈ 46.0, #D55E00 ≈ 54.2 (CIE 1976 formulas, computed by hand outside the project)
        assertThat(Math.abs(ColourSpace.srgbToLab(first)[0] - ColourSpace.srgbToLab(second)[0])).isGreaterThan(8);
    }

    @Test
    void coloursWrapAroundAfterTheLast() {
        assertThat(ConditionPalette.colour(ConditionPalette.COLOURS.size())).isEqualTo(ConditionPalette.colour(0));
    }
}
