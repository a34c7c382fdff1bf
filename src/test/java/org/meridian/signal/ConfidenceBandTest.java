package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.descriptive.SummaryStatistics;
import org.junit.jupiter.api.Test;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.testing.StudyFixtures;

class ConfidenceBandTest {
    private static final TimeAxis AXIS = new TimeAxis(0, 100, 12);

    @Test
    void tQuantilesAreStudentsAsTabulated() {
        // Student t table (from memory): t(0.975; 9) = 2.262, t(0.975; 19) = 2.093, t(0.995; 9) = 3.250
        assertThat(ConfidenceBand.tQuantile(0.95, 9)).isCloseTo(2.262, within(5e-4));
        assertThat(ConfidenceBand.tQuantile(0.95, 19)).isCloseTo(2.093, within(5e-4));
        assertThat(ConfidenceBand.tQuantile(0.99, 9)).isCloseTo(3.250, within(5e-4));
        // and exactly Commons Math's TDistribution
        assertThat(ConfidenceBand.tQuantile(0.95, 13))
                .isEqualTo(new TDistribution(13).inverseCumulativeProbability(0.975));
    }

    @Test
    void theBandAcrossParticipantsIsStudentsTInterval() {
        Study study = StudyFixtures.randomStudy(10, List.of("rare"), List.of("Cz", "Pz"), AXIS, 21);
        ConditionExpression rare = ConditionExpression.condition("rare");
        ConfidenceBand band = ConfidenceBand.acrossParticipants(study, rare, 0.95, Set.of("p10"));
        for (int s = 0; s < AXIS.samples(); s++) {
            SummaryStatistics stats = new SummaryStatistics();
            for (int p = 0; p < 9; p++) {
                stats.addValue(study.waveforms(p, 0).value(1, s));
            }
            // t-interval: mean ± t(0.975; N−1)·s/√N, s and t from Commons Math
            double h = new TDistribution(8).inverseCumulativeProbability(0.975)
                    * stats.getStandardDeviation() / Math.sqrt(9);
            assertThat((double) band.mean().value(1, s)).isCloseTo(stats.getMean(), within(1e-5));
            assertThat((double) band.halfWidth().value(1, s)).isCloseTo(h, within(1e-5));
            assertThat((double) band.upper().value(1, s)).isCloseTo(stats.getMean() + h, within(1e-5));
        }
        assertThat(band.participants()).isEqualTo(9);
    }

    @Test
    void withinParticipantBandsAreCousineauWithMoreysCorrection() {
        List<String> conditions = List.of("a", "b", "c");
        Study study = StudyFixtures.randomStudy(8, conditions, List.of("Cz"), AXIS, 4);
        List<ConditionExpression> waves = conditions.stream().map(ConditionExpression::condition).toList();
        List<ConfidenceBand> bands = ConfidenceBand.withinParticipants(study, waves, 0.95, Set.of());
        int j = 3;
        int n = 8;
        double t = new TDistribution(n - 1).inverseCumulativeProbability(0.975);
        for (int s = 0; s < AXIS.samples(); s++) {
            double grand = 0;
            for (int p = 0; p < n; p++) {
                for (int k = 0; k < j; k++) {
                    grand += study.waveforms(p, k).value(0, s) / (n * j);
                }
            }
            for (int k = 0; k < j; k++) {
                SummaryStatistics normalised = new SummaryStatistics();
                for (int p = 0; p < n; p++) {
                    double own = 0;
                    for (int kk = 0; kk < j; kk++) {
                        own += study.waveforms(p, kk).value(0, s) / j;
                    }
                    // Cousineau (2005): y = x − participant mean + grand mean
                    normalised.addValue(study.waveforms(p, k).value(0, s) - own + grand);
                }
                double cousineau = t * normalised.getStandardDeviation() / Math.sqrt(n);
                // Morey (2008): multiply by √(J/(J−1))
                assertThat((double) bands.get(k).halfWidth().value(0, s))
                        .isCloseTo(cousineau * Math.sqrt(j / (j - 1.0)), within(1e-5));
            }
        }
    }

    @Test
    void forTwoConditionsTheWithinBandIsTheDifferenceIntervalOverRootTwo() {
        Study study = StudyFixtures.randomStudy(12, List.of("a", "b"), List.of("Cz"), AXIS, 9);
        List<ConfidenceBand> bands = ConfidenceBand.withinParticipants(study,
                List.of(ConditionExpression.condition("a"), ConditionExpression.condition("b")), 0.95, Set.of());
        ConfidenceBand diff = ConfidenceBand.acrossParticipants(study,
                ConditionExpression.parse("a - b", study), 0.95, Set.of());
        for (int s = 0; s < AXIS.samples(); s++) {
            // J = 2: the normalised values are ±d/2 about the grand mean, s_y = s_d/2, times √2
            // (Morey, 2008, algebra of the correction)
            assertThat((double) bands.get(0).halfWidth().value(0, s))
                    .isCloseTo(diff.halfWidth().value(0, s) / Math.sqrt(2), within(1e-5));
            assertThat(bands.get(1).halfWidth().value(0, s)).isEqualTo(bands.get(0).halfWidth().value(0, s));
        }
    }

    @Test
    void participantsWhoDifferOnlyByAnOffsetHaveNoWithinParticipantSpread() {
        Study.Builder b = Study.builder("offsets");
        for (int p = 0; p < 5; p++) {
            double offset = 3 * p;
            b.add("p" + p, "a", StudyFixtures.wave("Cz", AXIS, t -> offset + t / 50));
            b.add("p" + p, "b", StudyFixtures.wave("Cz", AXIS, t -> offset - t / 50));
        }
        Study study = b.build();
        List<ConfidenceBand> bands = ConfidenceBand.withinParticipants(study,
                List.of(ConditionExpression.condition("a"), ConditionExpression.condition("b")), 0.95, Set.of());
        ConfidenceBand across = ConfidenceBand.acrossParticipants(study, ConditionExpression.condition("a"),
                0.95, Set.of());
        // the between-participant offset is what the within-participant interval leaves out
        assertThat((double) bands.get(0).halfWidth().value(0, 5)).isCloseTo(0, within(1e-5));
        assertThat((double) across.halfWidth().value(0, 5)).isGreaterThan(1);
    }
}
