package org.meridian.span;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A small version of the span test's validation by simulation (the full table comes from
 * {@code SpanValidationRun}, see the README). 40 studies per case, 999 random sign patterns per
 * test: loose bounds that a valid test passes and that the broken variants, the swap of
 * normalised maps and a data-chosen split, fail on the same studies. {@code span()} is the
 * test of DESIGN §7, the command's default.
 */
class SpanValidationTest {
    private static final int STUDIES = 40;
    /** At most 6 of 40 false alarms: P(X ≥ 7) ≈ 0.003 for a valid test at α = 0.05. */
    private static final int MAX_FALSE_ALARMS = 6;

    @Test
    void oneMapPeakingBeforeTheSplitRarelyLooksLikeAChangeToTheSpanTestOnly() {
        SpanValidation.Case offCentre = SpanValidation.cases(16, 1).get(1);
        assertThat(offCentre.oneMap()).isTrue();
        SpanValidation.Tally t = SpanValidation.run(offCentre, STUDIES, 1000, 0.05, 0);
        // Binomial(40, 0.05) (textbook): a valid level-0.05 test exceeds 6 rejections of 40 with
        // probability ≈ 0.003
        assertThat(t.span()).isLessThanOrEqualTo(MAX_FALSE_ALARMS);
        assertThat(t.whitened()).isLessThanOrEqualTo(MAX_FALSE_ALARMS);
        // the bound has teeth: the swap test (DESIGN §7) and a split chosen from the data both
        // break it on the same studies
        assertThat(t.swap()).isGreaterThan(MAX_FALSE_ALARMS);
        assertThat(t.whitenedDataChosenSplit()).isGreaterThan(MAX_FALSE_ALARMS);
    }

    @Test
    void twoMapsEightyMillisecondsApartAreFound() {
        SpanValidation.Case apart = SpanValidation.cases(16, 1).get(5);
        assertThat(apart.oneMap()).isFalse();
        SpanValidation.Tally t = SpanValidation.run(apart, 20, 2000, 0.05, 0);
        // issue 6 target: power ≥ 0.9 at 80 ms at the demo's noise level; loose here (≥ 0.8 of
        // 20 studies) since the full run measures it on 200
        assertThat(t.span()).isGreaterThanOrEqualTo(16);
    }

    @Test
    void casesCoverTheGridOfTheIssue() {
        List<SpanValidation.Case> cases = SpanValidation.cases(16, 1);
        assertThat(cases).extracting(SpanValidation.Case::oneMap)
                .containsExactly(true, true, true, true, false, false, false);
    }
}
