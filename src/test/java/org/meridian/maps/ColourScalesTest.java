package org.meridian.maps;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;

class ColourScalesTest {
    private static double lightness(int rgb) {
        return ColourSpace.srgbToLab(rgb)[0];
    }

    @Test
    void cielabOfKnownColours() {
        // CIE 1976: the reference white has L* = 100, a* = b* = 0
        assertThat(ColourSpace.srgbToLab(0xffffff)).containsExactly(new double[] {100, 0, 0}, within(0.01));
        // sRGB red in CIELAB (D65): 53.24, 80.09, 67.20 (from memory; widely tabulated)
        assertThat(ColourSpace.srgbToLab(0xff0000)).containsExactly(new double[] {53.24, 80.09, 67.20}, within(0.02));
        for (int rgb : new int[] {0x000000, 0x3b4cc0, 0xb40426, 0x7f7f7f, 0x12ab34}) {
            assertThat(ColourSpace.labToSrgb(ColourSpace.srgbToLab(rgb))).isEqualTo(rgb);
        }
    }

    @Test
    void divergingScaleFollowsMorelandsConstruction() {
        ColourScale s = ColourScales.DIVERGING;
        assertThat(s.rgb(0)).isEqualTo(0x3b4cc0);
        assertThat(s.rgb(1)).isEqualTo(0xb40426);
        double[] cool = ColourSpace.labToMsh(ColourSpace.srgbToLab(s.rgb(0)));
        double[] warm = ColourSpace.labToMsh(ColourSpace.srgbToLab(s.rgb(1)));
        // Moreland (2009): the cool end is Msh (80, 1.08, −1.1), the warm end (80, 1.08, 0.5) (from memory)
        assertThat(cool[0]).isCloseTo(80, within(0.1));
        assertThat(new double[] {cool[1], cool[2]}).containsExactly(new double[] {1.08, -1.1}, within(0.005));
        assertThat(warm[0]).isCloseTo(80, within(0.1));
        assertThat(new double[] {warm[1], warm[2]}).containsExactly(new double[] {1.08, 0.5}, within(0.005));
        // Moreland (2009): the midpoint is the neutral M = 88, sRGB (221, 221, 221) (from memory)
        int mid = s.rgb(0.5);
        assertThat(java.util.List.of(mid >> 16, (mid >> 8) & 0xff, mid & 0xff))
                .allSatisfy(c -> assertThat(c).isBetween(220, 222));
    }

    @Test
    void divergingScaleIsSymmetricInLightnessAndEvenInItsSteps() {
        ColourScale s = ColourScales.DIVERGING;
        int steps = 32;
        double smallest = Double.MAX_VALUE;
        double largest = 0;
        for (int i = 0; i < steps; i++) {
            double t = i / (double) steps;
            // Moreland (2009): both arms rise in lightness to the midpoint and mirror each other
            assertThat(lightness(s.rgb(t))).isCloseTo(lightness(s.rgb(1 - t)), within(1.5));
            if (i < steps / 2) {
                assertThat(lightness(s.rgb(t + 1.0 / steps))).isGreaterThan(lightness(s.rgb(t)));
            }
            double step = ColourSpace.deltaE(s.rgb(t), s.rgb(t + 1.0 / steps));
            smallest = Math.min(smallest, step);
            largest = Math.max(largest, step);
        }
        // perceptual uniformity (Moreland, 2009): equal steps in t give ΔE*ab steps within a factor 1.6
        assertThat(largest / smallest).isLessThan(1.6);
    }

    @Test
    void blueYellowScaleKeepsItsOrderForEveryDichromacy() {
        ColourScale s = ColourScales.BLUE_YELLOW;
        int steps = 40;
        for (Dichromacy k : Dichromacy.values()) {
            for (int i = 0; i < steps; i++) {
                double t = i / (double) steps;
                double here = lightness(k.simulate(s.rgb(t)));
                double next = lightness(k.simulate(s.rgb(t + 1.0 / steps)));
                // Machado et al. (2009) simulation: lightness still rises from − to +
                assertThat(next).as("%s at t=%s", k, t).isGreaterThan(here);
            }
            for (double t : new double[] {0, 0.1, 0.2, 0.3, 0.4}) {
                int negative = k.simulate(s.rgb(t));
                int positive = k.simulate(s.rgb(1 - t));
                // common practice: ΔE*ab ≥ 15 tells two colours apart at a glance
                assertThat(ColourSpace.deltaE(negative, positive)).as("%s at ±%s", k, 1 - 2 * t)
                        .isGreaterThan(15);
            }
        }
        // the midpoint is a neutral grey
        double[] mid = ColourSpace.srgbToLab(s.rgb(0.5));
        assertThat(Math.hypot(mid[1], mid[2])).isLessThan(1.5);
        assertThat(mid[0]).isCloseTo(57.5, within(1.0));
    }

    @Test
    void blueYellowArmsHaveEqualPerceptualLength() {
        ColourScale s = ColourScales.BLUE_YELLOW;
        double lower = 0;
        double upper = 0;
        for (int i = 0; i < 50; i++) {
            lower += ColourSpace.deltaE(s.rgb(i / 100.0), s.rgb((i + 1) / 100.0));
            upper += ColourSpace.deltaE(s.rgb(0.5 + i / 100.0), s.rgb(0.5 + (i + 1) / 100.0));
        }
        // common practice: a diverging scale weighs equal distances from zero equally
        assertThat(Math.abs(lower - upper) / (lower + upper)).isLessThan(0.03);
    }

    @Test
    void scalesAreFoundByNameAndUnknownNamesAreListed() {
        assertThat(ColourScales.byName("Blue-Yellow")).isSameAs(ColourScales.BLUE_YELLOW);
        assertThatThrownBy(() -> ColourScales.byName("rainbow")).isInstanceOf(BadInputException.class)
                .hasMessage("no colour scale \"rainbow\" (there are diverging, blue-yellow)");
    }
}
