package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Set;
import org.junit.jupiter.api.Test;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.testing.StudyFixtures;

class JackknifeTest {

    @Test
    void leaveOneOutAveragesAreTheGrandAveragesWithoutEachParticipant() {
        TimeAxis axis = new TimeAxis(0, 100, 8);
        Study study = StudyFixtures.randomStudy(5, java.util.List.of("a"), java.util.List.of("Cz"), axis, 2);
        double[][] series = new double[5][8];
        for (int p = 0; p < 5; p++) {
            study.waveforms(p, 0).channelInto(0, series[p]);
        }
        double[][] loo = Jackknife.leaveOneOutAverages(series);
        for (int p = 0; p < 5; p++) {
            Waveforms without = GrandAverage.of(study, ConditionExpression.condition("a"),
                    GrandAverage.Weighting.UNWEIGHTED, Set.of(study.participants().get(p)));
            for (int s = 0; s < 8; s++) {
                assertThat(loo[p][s]).isCloseTo(without.value(0, s), within(1e-5));
            }
        }
    }

    @Test
    void retrievedScoresHaveTheMeanOfTheSubsampleScoresAndNMinusOneTimesTheirSpread() {
        double[] j = {312.0, 308.5, 315.25, 310.0, 309.75, 311.5};
        double[] x = Jackknife.retrieve(j);
        double meanJ = 0;
        double meanX = 0;
        for (int i = 0; i < j.length; i++) {
            meanJ += j[i] / j.length;
            meanX += x[i] / j.length;
        }
        // Smulders (2010): x_i = N·J̄ − (N−1)·J_i, so x̄ = J̄ and x_i − x̄ = −(N−1)(J_i − J̄)
        assertThat(meanX).isCloseTo(meanJ, within(1e-9));
        for (int i = 0; i < j.length; i++) {
            assertThat(x[i] - meanX).isCloseTo(-(j.length - 1) * (j[i] - meanJ), within(1e-9));
        }
    }

    @Test
    void forALinearScoreTheRetrievedScoresAreTheIndividualScores() {
        double[] individual = {2.5, -1.0, 4.0, 0.5, 3.0};
        double[][] series = new double[individual.length][1];
        for (int i = 0; i < individual.length; i++) {
            series[i][0] = individual[i];
        }
        double[][] loo = Jackknife.leaveOneOutAverages(series);
        double[] j = new double[individual.length];
        for (int i = 0; i < j.length; i++) {
            j[i] = loo[i][0];
        }
        // Smulders (2010): for a measure linear in the wave, retrieval recovers each x_i exactly
        double[] x = Jackknife.retrieve(j);
        for (int i = 0; i < individual.length; i++) {
            assertThat(x[i]).isCloseTo(individual[i], within(1e-12));
        }
    }
}
