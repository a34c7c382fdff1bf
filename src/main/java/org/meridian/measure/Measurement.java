package org.meridian.measure;

import java.util.ArrayList;
import java.util.List;
import org.meridian.core.Study;
import org.meridian.core.TimeAxis;
import org.meridian.core.Waveforms;
import org.meridian.signal.ConditionWave;
import org.meridian.signal.GrandAverage;
import org.meridian.signal.Jackknife;
import org.meridian.signal.TimeWindow;

/**
 * Runs a {@link MeasureRequest} on a study and builds the {@link MeasureTable}.
 *
 * <p>For each condition wave, every included participant's wave is computed once (contrasts per
 * participant, DESIGN §6.1); for each channel or region the participants' series are taken out
 * (a region as the mean of its channels) and every measure is scored in every window. Rows come
 * in the order condition → channel → window → measure, and within that: the participants in
 * study order, then the jackknife's retrieved scores, then the grand average.
 *
 * <p>The grand-average row scores the (optionally trial-weighted) grand average. The jackknife
 * scores the N unweighted leave-one-out averages J_i and reports x_i = N·J̄ − (N − 1)·J_i
 * (Smulders, 2010) under {@code measure (jackknife)}; if any J_i has no value, no retrieved score
 * can be formed and the rows stay empty.
 */
public final class Measurement {
    private Measurement() {
    }

    public static MeasureTable run(Study study, MeasureRequest request) {
        List<MeasureTable.Row> rows = new ArrayList<>();
        List<MeasureTable.Warning> warnings = new ArrayList<>();
        List<Integer> included = new ArrayList<>();
        for (int p = 0; p < study.participants().size(); p++) {
            if (!GrandAverage.isExcluded(study.participants().get(p), request.excluded())) {
                included.add(p);
            }
        }
        for (ConditionWave condition : request.conditions()) {
            new ConditionRun(study, request, condition, included, rows, warnings).run();
        }
        return new MeasureTable(rows, warnings);
    }

    /** The work for one condition wave. */
    private static final class ConditionRun {
        private final Study study;
        private final MeasureRequest request;
        private final ConditionWave condition;
        private final List<Integer> included;
        private final List<MeasureTable.Row> rows;
        private final List<MeasureTable.Warning> warnings;

        ConditionRun(Study study, MeasureRequest request, ConditionWave condition,
                List<Integer> included, List<MeasureTable.Row> rows,
                List<MeasureTable.Warning> warnings) {
            this.study = study;
            this.request = request;
            this.condition = condition;
            this.included = included;
            this.rows = rows;
            this.warnings = warnings;
        }

        void run() {
            double[] weights = GrandAverage.weights(study, request.weighting(), request.excluded(),
                    p -> request.weighting() == GrandAverage.Weighting.TRIALS
                            ? condition.trialWeight(study, p) : 1);
            int n = included.size();
            Waveforms[] waves = new Waveforms[n];
            for (int i = 0; i < n; i++) {
                waves[i] = condition.forParticipant(study, included.get(i));
            }
            TimeAxis axis = waves[0].axis();
            List<TimeWindow.SampleRange> ranges = new ArrayList<>();
            for (TimeWindow w : request.windows()) {
                ranges.add(w.resolve(axis));
            }
            List<Region> regions = new ArrayList<>();
            if (request.channels().isEmpty()) {
                regions.addAll(Region.eachChannel(waves[0].labels()));
            } else {
                for (String spec : request.channels()) {
                    regions.add(Region.parse(spec, waves[0].labels()));
                }
            }
            if (request.jackknife() && n < 2) {
                throw new org.meridian.core.BadInputException(
                        "the jackknife needs at least two participants");
            }
            double[][] series = new double[n][axis.samples()];
            for (Region region : regions) {
                int[] idx = region.indices(waves[0]);
                for (int i = 0; i < n; i++) {
                    Region.meanInto(waves[i], idx, series[i]);
                }
                double[] grand = request.grand() ? weightedMean(series, weights) : null;
                double[][] leaveOneOut = request.jackknife() ? Jackknife.leaveOneOutAverages(series) : null;
                for (int w = 0; w < ranges.size(); w++) {
                    TimeWindow window = request.windows().get(w);
                    TimeWindow.SampleRange r = ranges.get(w);
                    for (Measure m : request.measures()) {
                        String unit = m.unit(waves[0].unit());
                        Cell cell = new Cell(region.label(), m, window, unit);
                        for (int i = 0; i < n; i++) {
                            Score s = m.score(new Trace(series[i], axis, r.from(), r.to()), request.settings());
                            add(cell, study.participants().get(included.get(i)), s, "");
                        }
                        if (leaveOneOut != null) {
                            jackknife(cell, leaveOneOut, axis, r);
                        }
                        if (grand != null) {
                            Score s = m.score(new Trace(grand, axis, r.from(), r.to()), request.settings());
                            add(cell, MeasureTable.GRAND, s, "");
                        }
                    }
                }
            }
        }

        private void jackknife(Cell cell, double[][] leaveOneOut, TimeAxis axis, TimeWindow.SampleRange r) {
            int n = leaveOneOut.length;
            double[] scores = new double[n];
            String qualifier = null;
            List<String> emptyFor = new ArrayList<>();
            List<String> qualifiedFor = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                Score s = cell.measure.score(new Trace(leaveOneOut[i], axis, r.from(), r.to()),
                        request.settings());
                scores[i] = s.value();
                String name = study.participants().get(included.get(i));
                if (s.isEmpty()) {
                    emptyFor.add(name);
                } else if (s.qualifier() != null) {
                    qualifier = s.qualifier();
                    qualifiedFor.add(name);
                }
            }
            String jackknifeName = MeasureTable.JACKKNIFE_SUFFIX;
            if (!emptyFor.isEmpty()) {
                warn(cell, "jackknife", "the average without " + list(emptyFor) + " has no value,"
                        + " so no retrieved score can be formed; values left empty");
                for (int i = 0; i < n; i++) {
                    row(cell, study.participants().get(included.get(i)), null, jackknifeName, Double.NaN);
                }
                return;
            }
            if (qualifier != null) {
                warn(cell, "jackknife", "the average without " + list(qualifiedFor) + " gave the "
                        + qualifier + " instead; every retrieved score is marked");
            }
            double[] retrieved = Jackknife.retrieve(scores);
            for (int i = 0; i < n; i++) {
                row(cell, study.participants().get(included.get(i)), qualifier, jackknifeName, retrieved[i]);
            }
        }

        private void add(Cell cell, String participant, Score s, String suffix) {
            if (s.warning() != null) {
                warn(cell, participant, s.warning());
            }
            row(cell, participant, s.qualifier(), suffix, s.value());
        }

        private void row(Cell cell, String participant, String qualifier, String suffix, double value) {
            String measure = cell.measure.name() + (qualifier == null ? "" : " (" + qualifier + ")") + suffix;
            rows.add(new MeasureTable.Row(participant, condition.name(), cell.channel, measure,
                    cell.window, value, cell.unit));
        }

        private void warn(Cell cell, String participant, String message) {
            warnings.add(new MeasureTable.Warning(participant, condition.name(), cell.channel,
                    cell.measure.name(), cell.window, message));
        }

        private double[] weightedMean(double[][] series, double[] allWeights) {
            double[] out = new double[series[0].length];
            double total = 0;
            for (int i = 0; i < series.length; i++) {
                double w = allWeights[included.get(i)];
                total += w;
                for (int s = 0; s < out.length; s++) {
                    out[s] += w * series[i][s];
                }
            }
            for (int s = 0; s < out.length; s++) {
                out[s] /= total;
            }
            return out;
        }

        private static String list(List<String> names) {
            return names.size() <= 5 ? String.join(", ", names)
                    : String.join(", ", names.subList(0, 5)) + " and " + (names.size() - 5) + " more";
        }
    }

    private record Cell(String channel, Measure measure, TimeWindow window, String unit) {
    }
}
