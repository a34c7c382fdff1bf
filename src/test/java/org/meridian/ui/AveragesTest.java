package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.meridian.core.Study;
import org.meridian.core.Unit;
import org.meridian.core.Waveforms;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.ConfidenceBand;
import org.meridian.signal.GrandAverage;
import org.meridian.sim.ListeningDemo;
import org.meridian.sim.Simulator;

class AveragesTest {
    private static StudySession session;
    private static List<WaveEntry> entries;

    @BeforeAll
    static void simulateASmallDemo() {
        Study study = Simulator.simulate(ListeningDemo.scenario(5), 11).study();
        session = StudySession.of(study, null, "five");
        entries = ViewModel.entriesFor(session, List.of(ConditionExpression.parse("rare - frequent", study)));
    }

    @Test
    void theGfpIsThePopulationStandardDeviationOfEachMap() {
        Averages a = Averages.compute(session, entries, Set.of(), IntervalKind.NONE, Tasks.TaskProgress.NONE);
        Averages.WaveAverage rare = a.wave("rare");
        Waveforms field = rare.grand().select(session.fieldChannels());
        double[] map = new double[field.channelCount()];
        for (int s : new int[] {0, 100, 150, 250}) {
            field.sampleInto(s, map);
            // Lehmann & Skrandies (1980): GFP is the standard deviation across channels (divisor C);
            // Commons Math StandardDeviation without bias correction is that divisor
            assertThat(rare.gfp()[s]).isCloseTo(new StandardDeviation(false).evaluate(map), within(1e-9));
        }
    }

    @Test
    void leftOutParticipantsLeaveEveryAverageAndBand() {
        Averages a = Averages.compute(session, entries, Set.of("p02"), IntervalKind.WITHIN, Tasks.TaskProgress.NONE);
        Waveforms expected = GrandAverage.of(session.study(), entries.get(2).wave(),
                GrandAverage.Weighting.UNWEIGHTED, Set.of("p02"));
        Waveforms got = a.wave("rare - frequent").grand();
        assertThat(got.copyValues()).containsExactly(expected.copyValues());
        // the band of a contrast is the t-interval of its per-participant differences
        ConfidenceBand band = ConfidenceBand.acrossParticipants(session.study(), entries.get(2).wave(), 0.95, Set.of("p02"));
        assertThat(a.wave("rare - frequent").band().halfWidth().copyValues()).containsExactly(band.halfWidth().copyValues());
        // the loaded conditions shown together get Cousineau–Morey bands (Cousineau, 2005; Morey, 2008)
        List<ConfidenceBand> within = ConfidenceBand.withinParticipants(session.study(),
                List.of(entries.get(0).wave(), entries.get(1).wave()), 0.95, Set.of("p02"));
        assertThat(a.wave("frequent").band().halfWidth().copyValues()).containsExactly(within.get(0).halfWidth().copyValues());
        assertThat(a.excluded()).containsExactly("p02");
    }

    @Test
    void theCsdOfTheGrandAverageIsTheGrandAverageOfTheCsds() {
        Averages a = Averages.compute(session, entries, Set.of(), IntervalKind.NONE, Tasks.TaskProgress.NONE);
        Waveforms csdOfGrand = a.wave("rare").csd();
        assertThat(csdOfGrand.unit()).isEqualTo(Unit.MICROVOLT_PER_SQUARE_METRE);
        Study study = session.study();
        int rare = study.conditionIndex("rare");
        double[] sum = new double[csdOfGrand.channelCount() * csdOfGrand.sampleCount()];
        for (int p = 0; p < study.participants().size(); p++) {
            float[] v = session.csdOf(study.waveforms(p, rare)).copyValues();
            for (int i = 0; i < v.length; i++) {
                sum[i] += v[i] / study.participants().size();
            }
        }
        // a linear operator commutes with the mean (textbook identity); floats carry ~1e-6 relative
        float[] got = csdOfGrand.copyValues();
        double scale = a.wave("rare").maxAbs(MapQuantity.CSD);
        for (int i = 0; i < got.length; i += 97) {
            assertThat(got[i]).isCloseTo((float) sum[i], within((float) (1e-5 * scale)));
        }
    }

    @Test
    void theAutomaticColourRangeIsTheLargestValueAtTheElectrodes() {
        Averages a = Averages.compute(session, entries, Set.of(), IntervalKind.NONE, Tasks.TaskProgress.NONE);
        Waveforms field = a.wave("rare").grand().select(session.fieldChannels());
        double max = 0;
        for (float v : field.copyValues()) {
            max = Math.max(max, Math.abs(v));
        }
        assertThat(a.wave("rare").maxAbs(MapQuantity.POTENTIAL)).isEqualTo(max);
    }
}
