package org.meridian.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.GrandAverage;
import org.meridian.signal.TimeWindow;
import org.meridian.testing.StudyFixtures;

class MeasurementTest {
    private static final TimeAxis AXIS = new TimeAxis(-100, 250, 200);

    /** Participant p has a P3-like bump of amplitude 4 + p at 300 + 8p ms on every channel. */
    private static Study bumps(int participants) {
        Study.Builder b = Study.builder("bumps");
        for (int p = 0; p < participants; p++) {
            double amp = 4 + p;
            double latency = 300 + 8 * p;
            b.add(StudyFixtures.participant(p), "rare", StudyFixtures.waves(List.of("P3", "Pz", "P4"), AXIS,
                    List.of(t -> amp * bump(t, latency), t -> 2 * amp * bump(t, latency), t -> 0.5 * amp * bump(t, latency))),
                    10 + p);
            b.add(StudyFixtures.participant(p), "common", StudyFixtures.waves(List.of("P3", "Pz", "P4"), AXIS,
                    List.of(t -> 1, t -> 1, t -> 1)), 50);
        }
        return b.build();
    }

    private static double bump(double t, double centre) {
        return Math.exp(-Math.pow((t - centre) / 40, 2) / 2);
    }

    private static MeasureRequest.Builder request(Study study, String condition) {
        return MeasureRequest.builder().condition(ConditionExpression.parse(condition, study))
                .window(TimeWindow.parse("200:500"));
    }

    @Test
    void theTableHasTheDesignsColumnsAndOneValueARow() {
        Study study = bumps(3);
        MeasureTable table = Measurement.run(study, request(study, "rare").channel("Pz")
                .measure("peak").measure("peak-latency").grand(true).build());
        assertThat(table.toTsv().lines().findFirst()).contains(
                "participant\tcondition\tchannel\tmeasure\twindow_ms\tvalue\tunit");
        // the grand average's peak, by hand over the window's samples (75..150 at 4 ms steps)
        double best = Double.NEGATIVE_INFINITY;
        double bestMs = 0;
        for (int s = 75; s <= 150; s++) {
            double t = AXIS.timeMs(s);
            double mean = (8 * bump(t, 300) + 10 * bump(t, 308) + 12 * bump(t, 316)) / 3;
            if (mean > best) {
                best = mean;
                bestMs = t;
            }
        }
        assertThat(table.toTsv().lines().skip(1)).containsExactly(
                "p01\trare\tPz\tpeak\t200:500\t8\tµV",
                "p02\trare\tPz\tpeak\t200:500\t10\tµV",
                "p03\trare\tPz\tpeak\t200:500\t12\tµV",
                "grand\trare\tPz\tpeak\t200:500\t" + MeasureTable.formatValue(best) + "\tµV",
                "p01\trare\tPz\tpeak-latency\t200:500\t300\tms",
                "p02\trare\tPz\tpeak-latency\t200:500\t308\tms",
                "p03\trare\tPz\tpeak-latency\t200:500\t316\tms",
                "grand\trare\tPz\tpeak-latency\t200:500\t" + MeasureTable.formatValue(bestMs) + "\tms");
    }

    @Test
    void aRegionIsTheMeanOfItsChannelsUnderTheJoinedLabel() {
        Study study = bumps(2);
        MeasureTable table = Measurement.run(study, request(study, "rare").channel("p3+PZ+p4")
                .measure("peak").build());
        MeasureTable.Row row = table.rows().get(0);
        assertThat(row.channel()).isEqualTo("P3+Pz+P4");
        // mean of 1, 2 and 0.5 times the bump of amplitude 4: 3.5/3 · 4
        assertThat(row.value()).isCloseTo(4 * 3.5 / 3, within(1e-5));
    }

    @Test
    void contrastsAreMeasuredPerParticipant() {
        Study study = bumps(3);
        MeasureTable table = Measurement.run(study, request(study, "rare - common").channel("Pz")
                .measure("mean").grand(true).build());
        for (int p = 0; p < 3; p++) {
            MeasureTable.Row row = table.rows().get(p);
            double expected = 0;
            for (int s = 75; s <= 150; s++) {
                expected += 2 * (4 + p) * bump(AXIS.timeMs(s), 300 + 8 * p) - 1;
            }
            assertThat(row.condition()).isEqualTo("rare - common");
            assertThat(row.value()).isCloseTo(expected / 76, within(1e-5));
        }
    }

    @Test
    void jackknifeRowsAreMarkedAndAverageToTheGrandScoreForALinearMeasure() {
        Study study = bumps(5);
        MeasureTable table = Measurement.run(study, request(study, "rare").channel("Pz")
                .measure("mean").measure("frac-peak-latency").grand(true).jackknife(true).build());
        List<MeasureTable.Row> jack = table.rows().stream()
                .filter(r -> r.measure().equals("mean (jackknife)")).toList();
        assertThat(jack).hasSize(5);
        assertThat(jack).extracting(MeasureTable.Row::participant).containsExactly("p01", "p02", "p03", "p04", "p05");
        double grand = table.rows().stream().filter(r -> r.participant().equals("grand") && r.measure().equals("mean"))
                .findFirst().orElseThrow().value();
        // Smulders (2010): the retrieved scores average to the full grand average's score
        // (exactly so for a measure linear in the wave, such as the mean amplitude)
        assertThat(jack.stream().mapToDouble(MeasureTable.Row::value).average().orElseThrow())
                .isCloseTo(grand, within(1e-9));
        // for a mean amplitude the retrieved scores are the individual scores themselves
        for (int p = 0; p < 5; p++) {
            assertThat(jack.get(p).value()).isCloseTo(table.rows().get(p).value(), within(1e-9));
        }
        assertThat(table.rows()).anyMatch(r -> r.measure().equals("frac-peak-latency (jackknife)"));
    }

    @Test
    void anEmptyValueIsAnEmptyCellWithAWarning() {
        Study study = bumps(2);
        // the window starts after the rise has passed half the peak: no crossing inside it
        MeasureTable table = Measurement.run(study, MeasureRequest.builder()
                .condition(ConditionExpression.condition("rare")).channel("Pz")
                .window(TimeWindow.parse("290:400")).measure("frac-peak-latency").build());
        assertThat(table.rows().get(0).isEmpty()).isTrue();
        assertThat(table.toTsv().lines().skip(1).findFirst())
                .contains("p01\trare\tPz\tfrac-peak-latency\t290:400\t\tms");
        assertThat(table.warnings()).hasSize(2);
        assertThat(table.warnings().get(0).describe()).startsWith(
                "p01, rare, Pz, frac-peak-latency 290:400 ms: the wave does not cross 50 % of the peak");
    }

    @Test
    void aMissingLocalPeakIsMarkedInTheMeasureCell() {
        Study study = bumps(2);
        MeasureTable table = Measurement.run(study, MeasureRequest.builder()
                .condition(ConditionExpression.condition("common")).channel("Pz")
                .window(TimeWindow.parse("200:300")).measure("local-peak").jackknife(true).build());
        assertThat(table.rows()).extracting(MeasureTable.Row::measure).containsExactly(
                "local-peak (window maximum)", "local-peak (window maximum)",
                "local-peak (window maximum) (jackknife)", "local-peak (window maximum) (jackknife)");
        assertThat(table.warnings()).isNotEmpty();
    }

    @Test
    void excludedParticipantsAndTrialWeightsShapeTheGrandRow() {
        Study study = bumps(3);
        MeasureTable table = Measurement.run(study, request(study, "rare").channel("P3").measure("peak")
                .grand(true).weighting(GrandAverage.Weighting.TRIALS).excluded(Set.of("P02")).build());
        assertThat(table.rows()).extracting(MeasureTable.Row::participant).containsExactly("p01", "p03", "grand");
        // trial-weighted: (10 · x_p01 + 12 · x_p03) / 22 at the peak of the weighted mean
        double best = Double.NEGATIVE_INFINITY;
        for (int s = 75; s <= 150; s++) {
            double t = AXIS.timeMs(s);
            best = Math.max(best, (10 * 4 * bump(t, 300) + 12 * 6 * bump(t, 316)) / 22);
        }
        assertThat(table.rows().get(2).value()).isCloseTo(best, within(1e-5));
    }

    @Test
    void mistakesAreNamedBeforeAnyWork() {
        Study study = bumps(2);
        assertThatThrownBy(() -> Measurement.run(study, MeasureRequest.builder()
                .condition(ConditionExpression.condition("rare")).window(TimeWindow.parse("600:900"))
                .measure("mean").build()))
                .isInstanceOf(BadInputException.class)
                .hasMessage("window 600:900 ms lies outside the data (-100..696 ms)");
        assertThatThrownBy(() -> Measurement.run(study, request(study, "rare").channel("Pzz").measure("mean").build()))
                .hasMessage("no channel Pzz; did you mean Pz?");
        assertThatThrownBy(() -> request(study, "rare").measure("area").measure("peak")
                .settings(MeasureSettings.defaults().withPolarity(Polarity.SIGNED)).build())
                .hasMessageContaining("peak needs polarity pos or neg");
        assertThatThrownBy(() -> Measurement.run(study, request(study, "rare").measure("mean")
                .excluded(Set.of("p09")).build()))
                .hasMessageContaining("no such participant");
    }
}
