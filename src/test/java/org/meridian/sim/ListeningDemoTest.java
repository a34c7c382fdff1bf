package org.meridian.sim;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.montage.StandardSystem;
import org.meridian.signal.GrandAverage;

/** The demo scenario shows what the README says it shows. */
class ListeningDemoTest {
    private static Study noisy;
    private static Waveforms cleanFrequent;
    private static Waveforms cleanRare;

    @BeforeAll
    static void simulate() {
        noisy = Simulator.simulate(ListeningDemo.scenario(), ListeningDemo.SEED).study();
        Study clean = Simulator.simulate(ListeningDemo.scenario().withNoise(NoiseModel.NONE),
                ListeningDemo.SEED).study();
        cleanFrequent = GrandAverage.of(clean, 0);
        cleanRare = GrandAverage.of(clean, 1);
    }

    @Test
    void hasSixteenParticipantsTwoConditionsAndSixtyFourTenTenChannels() {
        assertThat(noisy.participants()).hasSize(16);
        assertThat(noisy.conditions()).containsExactly("frequent", "rare");
        assertThat(noisy.channelLabels()).hasSize(64);
        assertThat(StandardSystem.TEN_TEN.montage().labels()).containsAll(noisy.channelLabels());
        assertThat(noisy.axis().firstMs()).isEqualTo(-200);
        assertThat(noisy.axis().lastMs()).isEqualTo(800);
        assertThat(noisy.axis().rateHz()).isEqualTo(250);
    }

    @Test
    void everyParticipantHasFewerRareTrialsThanFrequentOnes() {
        for (int p = 0; p < 16; p++) {
            assertThat(noisy.trials(p, 1).orElseThrow()).isBetween(60, 80)
                    .isLessThan(noisy.trials(p, 0).orElseThrow());
        }
    }

    @Test
    void theLatePeakOfRareSoundsChangesItsScalpDistributionAcrossItsSpan() {
        // spatial correlation of two maps (Lehmann & Skrandies 1980; DISS = √(2(1 − r)))
        assertThat(correlation(map(cleanRare, 300), map(cleanRare, 392))).isLessThan(0.5);
        // while the frequent condition's late peak is one source, whose map stays the same
        assertThat(correlation(map(cleanFrequent, 340), map(cleanFrequent, 440))).isGreaterThan(0.98);
    }

    @Test
    void theTwoLateSourcesPeakAboutNinetyMillisecondsApartAtDifferentPlaces() {
        Source front = source("late-frontocentral");
        Source back = source("late-parietal");
        double frontPeak = ((SourceComponent) front.components().get(0)).peakMs();
        double backPeak = ((SourceComponent) back.components().get(0)).peakMs();
        assertThat(backPeak - frontPeak).isBetween(80.0, 100.0);
        SphereHeadModel head = SphereHeadModel.standard();
        assertThat(strongest(head.leadField(front.positionM(), ListeningDemo.montage()).map(front.orientation())))
                .isIn("Fz", "FCz", "FC1", "FC2", "F1", "F2", "Cz");
        assertThat(strongest(head.leadField(back.positionM(), ListeningDemo.montage()).map(back.orientation())))
                .isIn("Pz", "CPz", "P1", "P2", "CP1", "CP2", "POz");
    }

    @Test
    void rareSoundsAddAFrontoCentralNegativityThatReversesAtTheMastoids() {
        double[] rare = map(cleanRare, 168);
        double[] frequent = map(cleanFrequent, 168);
        // a fronto-central negativity of rare minus frequent with positive mastoids (the pattern
        // of supratemporal generators under an average reference; textbook fact)
        assertThat(diff(rare, frequent, "FCz")).isLessThan(-1.5);
        assertThat(diff(rare, frequent, "Fz")).isLessThan(-1.0);
        assertThat(diff(rare, frequent, "TP9")).isGreaterThan(0.5);
        assertThat(diff(rare, frequent, "TP10")).isGreaterThan(0.5);
    }

    @Test
    void earlyAuditoryResponsesAreBilateralAndTangential() {
        double[] n1 = map(cleanFrequent, 100);
        // a tangential supratemporal dipole pair: negative at the vertex, positive at both mastoids
        assertThat(n1[index("Cz")]).isLessThan(-2);
        assertThat(n1[index("TP9")]).isGreaterThan(2);
        assertThat(n1[index("TP10")]).isGreaterThan(2);
        assertThat(n1[index("TP9")]).isCloseTo(n1[index("TP10")], org.assertj.core.api.Assertions.withinPercentage(40));
    }

    @Test
    void residualNoiseIsOfTheSizeSeenInRealAverages() {
        double ss = 0;
        int n = 0;
        int baselineEnd = noisy.axis().nearestIndex(0);
        for (int p = 0; p < 16; p++) {
            Waveforms w = noisy.waveforms(p, 1);
            for (int c = 0; c < w.channelCount(); c++) {
                for (int s = 0; s < baselineEnd; s++) {
                    ss += w.value(c, s) * w.value(c, s);
                    n++;
                }
            }
        }
        // averages of 60–80 trials typically keep 1–4 µV of background (common practice)
        assertThat(Math.sqrt(ss / n)).isBetween(1.0, 4.0);
    }

    private static Source source(String name) {
        return ListeningDemo.scenario().sources().stream().filter(s -> s.name().equals(name)).findFirst().orElseThrow();
    }

    private static String strongest(double[] map) {
        int best = 0;
        for (int c = 1; c < map.length; c++) {
            if (map[c] > map[best]) {
                best = c;
            }
        }
        return ListeningDemo.montage().labels().get(best);
    }

    private static int index(String label) {
        return cleanRare.requireIndex(label);
    }

    private static double diff(double[] a, double[] b, String label) {
        return a[index(label)] - b[index(label)];
    }

    private static double[] map(Waveforms w, double timeMs) {
        double[] m = new double[w.channelCount()];
        w.sampleInto(w.axis().nearestIndex(timeMs), m);
        return m;
    }

    private static double correlation(double[] a, double[] b) {
        double ma = mean(a);
        double mb = mean(b);
        double sab = 0;
        double saa = 0;
        double sbb = 0;
        for (int i = 0; i < a.length; i++) {
            sab += (a[i] - ma) * (b[i] - mb);
            saa += (a[i] - ma) * (a[i] - ma);
            sbb += (b[i] - mb) * (b[i] - mb);
        }
        return sab / Math.sqrt(saa * sbb);
    }

    private static double mean(double[] a) {
        return java.util.Arrays.stream(a).average().orElseThrow();
    }
}
