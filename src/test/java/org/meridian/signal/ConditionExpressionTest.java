package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.testing.StudyFixtures;

class ConditionExpressionTest {
    private static final List<String> CONDITIONS = List.of("rare", "common", "go left", "go right");

    private static ConditionExpression parse(String text) {
        return ConditionExpression.parse(text, CONDITIONS);
    }

    private static ExpressionSyntaxException error(String text) {
        try {
            parse(text);
        } catch (ExpressionSyntaxException e) {
            return e;
        }
        throw new AssertionError("expected \"" + text + "\" to be refused");
    }

    @Test
    void readsDifferenceWavesAndWeightedSums() {
        assertThat(parse("rare - common").terms()).containsExactly(
                new ConditionExpression.Term(1, "rare"), new ConditionExpression.Term(-1, "common"));
        assertThat(parse("0.5*rare + 0.5*common - 'go left'").terms()).containsExactly(
                new ConditionExpression.Term(0.5, "rare"), new ConditionExpression.Term(0.5, "common"),
                new ConditionExpression.Term(-1, "go left"));
        assertThat(parse("('go left' + 'go right')/2 - RARE")).isEqualTo(
                parse("0.5*'go left' + 0.5*'go right' - rare"));
        assertThat(parse("rare + rare - 3*common + common").terms()).containsExactly(
                new ConditionExpression.Term(2, "rare"), new ConditionExpression.Term(-2, "common"));
        assertThat(parse("-(rare - common) * 2").terms()).containsExactly(
                new ConditionExpression.Term(-2, "rare"), new ConditionExpression.Term(2, "common"));
        assertThat(parse("rare * 1e-1").terms()).containsExactly(new ConditionExpression.Term(0.1, "rare"));
        assertThat(parse("rare").isSingleCondition()).isTrue();
    }

    @Test
    void quotedNamesMayHoldOperatorsAndQuotes() {
        List<String> odd = List.of("a-b", "it's", "2back");
        ConditionExpression e = ConditionExpression.parse("'a-b' - 'it''s' + 0.5 * '2back'", odd);
        assertThat(e.terms()).containsExactly(new ConditionExpression.Term(1, "a-b"),
                new ConditionExpression.Term(-1, "it's"), new ConditionExpression.Term(0.5, "2back"));
        assertThat(e.canonicalText()).isEqualTo("'a-b' - 'it''s' + 0.5*'2back'");
        assertThat(ConditionExpression.parse(e.canonicalText(), odd)).isEqualTo(e);
    }

    @Test
    void aWholeExpressionThatIsOneConditionsNameIsThatCondition() {
        // common practice: a single file's condition is named after the file, dashes and all
        List<String> names = List.of("dip-10-20", "dip");
        assertThat(ConditionExpression.parse(" dip-10-20 ", names).terms())
                .containsExactly(new ConditionExpression.Term(1, "dip-10-20"));
        // anything else is still read as an expression
        assertThat(ConditionExpression.parse("'dip-10-20' - dip", names).terms()).containsExactly(
                new ConditionExpression.Term(1, "dip-10-20"), new ConditionExpression.Term(-1, "dip"));
    }

    @Test
    void theNameIsTheTextAsWrittenAndTheCanonicalFormIsTidy() {
        ConditionExpression e = parse("  0.5*rare+0.5*common-'go left' ");
        assertThat(e.name()).isEqualTo("0.5*rare+0.5*common-'go left'");
        assertThat(e.canonicalText()).isEqualTo("0.5*rare + 0.5*common - 'go left'");
        assertThat(ConditionExpression.of(List.of(new ConditionExpression.Term(-1.0 / 3, "a"))).name())
                .isEqualTo("-0.333333*a");
    }

    @Test
    void anUnknownNamePointsAtItselfAndSuggestsTheNearestCondition() {
        ExpressionSyntaxException e = error("rare - comon");
        assertThat(e.position()).isEqualTo(7);
        assertThat(e.length()).isEqualTo(5);
        assertThat(e.suggestion()).contains("common");
        assertThat(e.reason()).isEqualTo("no condition \"comon\"; did you mean \"common\"?");
        assertThat(e.getMessage()).isEqualTo("condition expression \"rare - comon\", character 8: "
                + "no condition \"comon\"; did you mean \"common\"?");
        assertThat(error("'go lft' - rare").suggestion()).contains("go left");
        // NearestName: a name that begins with what was written is suggested first
        assertThatThrownBy(() -> ConditionExpression.parse("rare - freq", List.of("rare", "frequent")))
                .isInstanceOfSatisfying(ExpressionSyntaxException.class,
                        x -> assertThat(x.suggestion()).contains("frequent"));
    }

    @Test
    void everySyntaxErrorCarriesItsPositionAndReason() {
        assertThat(error("").reason()).contains("empty");
        assertThat(error("rare -").position()).isEqualTo(6);
        assertThat(error("rare -").reason()).contains("should follow");
        assertThat(error("rare * common").position()).isEqualTo(5);
        assertThat(error("rare * common").reason()).contains("cannot be multiplied");
        assertThat(error("rare / common").position()).isEqualTo(5);
        assertThat(error("rare / 0").position()).isEqualTo(7);
        assertThat(error("rare / 0").reason()).isEqualTo("division by zero");
        assertThat(error("rare + 1").position()).isEqualTo(7);
        assertThat(error("rare + 1").reason()).contains("a number cannot be added");
        assertThat(error("2 - rare").position()).isEqualTo(0);
        assertThat(error("'go left - rare").position()).isEqualTo(0);
        assertThat(error("'go left - rare").reason()).contains("never closed");
        assertThat(error("0.5rare").position()).isEqualTo(3);
        assertThat(error("0.5rare").reason()).contains("write * between");
        assertThat(error("rare common").position()).isEqualTo(5);
        assertThat(error("rare common").reason()).contains("expected +, -, * or / before \"common\"");
        assertThat(error("(rare - common").position()).isEqualTo(0);
        assertThat(error("rare)").position()).isEqualTo(4);
        assertThat(error("rare # common").reason()).isEqualTo("unexpected character \"#\"");
        assertThat(error("\"rare\"").reason()).contains("single quotes");
        assertThat(error("rare - RARE").reason()).contains("cancel out");
        assertThat(error("3 * 4").reason()).contains("names no condition");
        assertThat(error("''").reason()).contains("empty condition name");
    }

    @Test
    void aContrastIsComputedPerParticipantThenAveraged() {
        TimeAxis axis = new TimeAxis(-100, 250, 50);
        Study study = StudyFixtures.randomStudy(6, List.of("rare", "common"), List.of("Fz", "Pz"), axis, 11);
        ConditionExpression diff = ConditionExpression.parse("rare - common", study);
        Waveforms p2 = diff.forParticipant(study, 2);
        for (int s = 0; s < axis.samples(); s++) {
            assertThat((double) p2.value(1, s)).isCloseTo(
                    study.waveforms(2, 0).value(1, s) - study.waveforms(2, 1).value(1, s), within(1e-5));
        }
        // unweighted: the mean of differences is the difference of means (linearity)
        Waveforms ga = diff.grandAverage(study);
        Waveforms gaRare = GrandAverage.of(study, 0);
        Waveforms gaCommon = GrandAverage.of(study, 1);
        assertThat((double) ga.value(0, 7)).isCloseTo(gaRare.value(0, 7) - gaCommon.value(0, 7), within(1e-5));
    }

    @Test
    void trialWeightsOfAContrastAreItsInverseNoiseVariance() {
        TimeAxis axis = new TimeAxis(0, 100, 10);
        Study study = StudyFixtures.randomStudy(4, List.of("rare", "common"), List.of("Fz"), axis, 3);
        ConditionExpression diff = ConditionExpression.parse("rare - common", study);
        int nRare = study.trials(1, 0).getAsInt();
        int nCommon = study.trials(1, 1).getAsInt();
        // Var(mean of n trials) = σ²/n, and variances of independent averages add
        // (textbook identity), so the inverse variance is 1/(1/n_rare + 1/n_common)
        assertThat(diff.trialWeight(study, 1)).isCloseTo(1 / (1.0 / nRare + 1.0 / nCommon), within(1e-12));
        assertThat(ConditionExpression.condition("rare").trialWeight(study, 1)).isEqualTo(nRare);

        Waveforms weighted = diff.grandAverage(study, GrandAverage.Weighting.TRIALS, Set.of("p04"));
        double num = 0;
        double den = 0;
        for (int p = 0; p < 3; p++) {
            double w = diff.trialWeight(study, p);
            num += w * diff.forParticipant(study, p).value(0, 4);
            den += w;
        }
        assertThat((double) weighted.value(0, 4)).isCloseTo(num / den, within(1e-5));
    }
}
