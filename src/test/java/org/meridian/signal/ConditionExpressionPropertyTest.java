package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.math.BigDecimal;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.testing.StudyFixtures;

/** Any linear combination, however it is written, evaluates to what it means. */
class ConditionExpressionPropertyTest {
    private static final List<String> CONDITIONS = List.of("rare", "common", "go left", "it's");
    private static final TimeAxis AXIS = new TimeAxis(0, 100, 20);

    /** One term as written: which condition, its coefficient (thousandths), and how it is spelt. */
    record Written(int condition, int milli, int style) {
    }

    @Provide
    Arbitrary<List<Written>> combinations() {
        return Combinators.combine(
                Arbitraries.integers().between(0, CONDITIONS.size() - 1),
                Arbitraries.integers().between(-5000, 5000).filter(m -> m != 0),
                Arbitraries.integers().between(0, 6))
                .as(Written::new).list().ofMinSize(1).ofMaxSize(6);
    }

    @Property(tries = 200)
    void anyLinearCombinationEvaluatesToTheSumComputedByHand(
            @ForAll("combinations") List<Written> terms, @ForAll("seeds") long seed) {
        double[] combined = new double[CONDITIONS.size()];
        for (Written t : terms) {
            combined[t.condition()] += t.milli() / 1000.0;
        }
        boolean anyLeft = false;
        for (double c : combined) {
            anyLeft |= Math.abs(c) > 1e-9;
        }
        Assume.that(anyLeft);

        String text = write(terms);
        ConditionExpression e = ConditionExpression.parse(text, CONDITIONS);
        Map<String, Waveforms> waves = new java.util.HashMap<>();
        java.util.Random random = new java.util.Random(seed);
        for (String c : CONDITIONS) {
            waves.put(c, StudyFixtures.wave("Cz", AXIS, t -> random.nextGaussian() * 10));
        }
        Waveforms result = e.evaluate(waves::get);
        for (int s = 0; s < AXIS.samples(); s++) {
            double byHand = 0;
            double scale = 1;
            for (Written t : terms) {
                double x = waves.get(CONDITIONS.get(t.condition())).value(0, s);
                byHand += t.milli() / 1000.0 * x;
                scale += Math.abs(t.milli() / 1000.0 * x);
            }
            // the definition of a linear combination, evaluated term by term as written
            assertThat((double) result.value(0, s)).as(text).isCloseTo(byHand, within(1e-5 * scale));
        }
        // and the canonical text reads back to the same terms (coefficients to 6 digits)
        List<ConditionExpression.Term> back = ConditionExpression.parse(e.canonicalText(), CONDITIONS).terms();
        assertThat(back).hasSameSizeAs(e.terms());
        for (int i = 0; i < back.size(); i++) {
            assertThat(back.get(i).condition()).isEqualTo(e.terms().get(i).condition());
            assertThat(back.get(i).coefficient()).isCloseTo(e.terms().get(i).coefficient(),
                    within(1e-5 * Math.abs(e.terms().get(i).coefficient())));
        }
    }

    @Provide
    Arbitrary<Long> seeds() {
        return Arbitraries.longs();
    }

    private static String write(List<Written> terms) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < terms.size(); i++) {
            Written t = terms.get(i);
            String number = new BigDecimal(Math.abs(t.milli())).movePointLeft(3).stripTrailingZeros()
                    .toPlainString();
            String name = ConditionExpression.quoteIfNeeded(CONDITIONS.get(t.condition()));
            if (t.style() == 6 && name.equals("rare")) {
                name = name.toUpperCase(Locale.ROOT);
            }
            String body = switch (t.style()) {
                case 0 -> number + "*" + name;
                case 1 -> name + "*" + number;
                case 2 -> number + " * " + name;
                case 3 -> "(" + number + ")*(" + name + ")";
                case 4 -> "(" + name + " * " + number + ")";
                case 5 -> number + "*" + name + "*1";
                default -> number + "*" + name;
            };
            boolean negative = t.milli() < 0;
            if (i == 0) {
                sb.append(negative ? "-" : "").append(body);
            } else if (negative && t.style() % 2 == 0) {
                sb.append(" + -").append(body);
            } else {
                sb.append(negative ? " - " : " + ").append(body);
            }
        }
        return sb.toString();
    }
}
