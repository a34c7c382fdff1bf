package org.meridian.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.math.RoundingMode;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

class FixedDecimalsPropertyTest {

    @Property(tries = 800)
    void agreesWithBigDecimalHalfUp(@ForAll float v, @ForAll @IntRange(min = 0, max = 12) int d) {
        if (!Float.isFinite(v)) {
            return;
        }
        // reference: java.math.BigDecimal of the exact float value, rounded HALF_UP
        String want = new BigDecimal(v).setScale(d, RoundingMode.HALF_UP).toPlainString();
        if (want.matches("-0\\.?0*")) {
            want = want.substring(1);
        }
        assertThat(FixedDecimals.format(v, d)).isEqualTo(want);
    }

    @Property(tries = 800)
    void agreesWithBigDecimalOnMicrovoltSizedValues(@ForAll("microvolts") float v,
            @ForAll @IntRange(min = 0, max = 8) int d) {
        String want = new BigDecimal(v).setScale(d, RoundingMode.HALF_UP).toPlainString();
        if (want.matches("-0\\.?0*")) {
            want = want.substring(1);
        }
        assertThat(FixedDecimals.format(v, d)).isEqualTo(want);
    }

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<Float> microvolts() {
        return net.jqwik.api.Arbitraries.floats().between(-500f, 500f);
    }

    @Example
    void halfwayCasesRoundAwayFromZero() {
        // 0.125 and 2.5 are exact binary fractions, so these are true ties
        assertThat(FixedDecimals.format(0.125f, 2)).isEqualTo("0.13");
        assertThat(FixedDecimals.format(-0.125f, 2)).isEqualTo("-0.13");
        assertThat(FixedDecimals.format(2.5f, 0)).isEqualTo("3");
        assertThat(FixedDecimals.format(-0.00001f, 4)).isEqualTo("0.0000");
        assertThat(FixedDecimals.format(-0f, 3)).isEqualTo("0.000");
    }
}
