package org.meridian.figure;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Random;
import org.junit.jupiter.api.Test;

class SvgExportTest {
    @Test
    void numbersArePrintedAsBigDecimalRoundsThem() {
        Random random = new Random(7);
        for (int i = 0; i < 20_000; i++) {
            double v = (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(8) - 3);
            // java.math.BigDecimal (HALF_UP on the value's exact decimal expansion) as the reference
            String expected = new BigDecimal(Math.abs(v)).setScale(3, RoundingMode.HALF_UP).stripTrailingZeros()
                    .toPlainString();
            if (new BigDecimal(expected).signum() != 0 && v < 0) {
                expected = "-" + expected;
            }
            assertThat(SvgExport.decimals(v, 3)).as("%s", v).isEqualTo(new BigDecimal(expected).signum() == 0 ? "0" : expected);
        }
        assertThat(SvgExport.decimals(-0.0001, 3)).isEqualTo("0");
        assertThat(SvgExport.decimals(2.5, 3)).isEqualTo("2.5");
        assertThat(SvgExport.decimals(-496.06299, 3)).isEqualTo("-496.063");
        assertThat(SvgExport.decimals(1e-9, 5)).isEqualTo("0");
    }
}
