package org.meridian.measure;

import java.util.ArrayList;
import java.util.List;
import org.meridian.core.BadInputException;
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
            // trial counts are needed only for a trial-weighted grand row; exclusions are checked always
            GrandAverage.Weighting weighting = request.grand() ? request.weighting()
                    : GrandAverage.Weighting.UNWEIGHTED;
            double[] weights = GrandAverage.weights(study, weighting, request.excluded(),
                    p -> condition.trialWeight(study, p));
            int n = included.size();
            Waveforms[] waves = new Waveforms[n];
            for (int i = 0; i < n; i++) {
                waves[i] = condition.forParticipant(study, included.get(i));
            }
            TimeAxis full = waves[0].axis();
            List<TimeWindow.SampleRange> windowRanges = new ArrayList<>();
            for (TimeWindow w : request.windows()) {
                windowRanges.add(w.resolve(full));
            }
            int first = firstSampleRead(windowRanges, full);
            int last = lastSampleRead(windowRanges, full);
            TimeAxis axis = new TimeAxis(full.timeMs(first), full.rateHz(), last - first + 1);
            List<TimeWindow.SampleRange> ranges = new ArrayList<>();
            for (TimeWindow.SampleRange r : windowRanges) {
                ranges.add(new TimeWindow.SampleRange(r.from() - first, r.to() - first));
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
                throw new BadInputException(
                        "the jackknife needs at least two participants");
            }
            double[][] series = new double[n][axis.samples()];
            double[][] leaveOneOut = request.jackknife() ? new double[n][axis.samples()] : null;
            for (Region region : regions) {
                int[] idx = region.indices(waves[0]);
                for (int i = 0; i < n; i++) {
                    Region.meanInto(waves[i], idx, first, series[i]);
                }
                double[] grand = request.grand() ? weightedMean(series, weights) : null;
                if (leaveOneOut != null) {
                    Jackknife.leaveOneOutAveragesInto(series, leaveOneOut);
                }
                for (int w = 0; w < ranges.size(); w++) {
                    TimeWindow window = request.windows().get(w);
                    TimeWindow.SampleRange r = ranges.get(w);
                    Trace[] traces = new Trace[n];
                    for (int i = 0; i < n; i++) {
                        traces[i] = new Trace(series[i], axis, r.from(), r.to());
                    }
                    Trace[] subsamples = null;
                    if (leaveOneOut != null) {
                        subsamples = new Trace[n];
                        for (int i = 0; i < n; i++) {
                            subsamples[i] = new Trace(leaveOneOut[i], axis, r.from(), r.to());
                        }
                    }
                    Trace grandTrace = grand == null ? null : new Trace(grand, axis, r.from(), r.to());
                    // score participant by participant, so each trace stays in cache for every
                    // measure; rows are then written measure by measure
                    List<Measure> measures = request.measures();
                    Score[][] scores = scoreAll(measures, traces);
                    Score[][] subsampleScores = subsamples == null ? null : scoreAll(measures, subsamples);
                    for (int m = 0; m < measures.size(); m++) {
                        Measure measure = measures.get(m);
                        Cell cell = new Cell(region.label(), measure, window, measure.unit(waves[0].unit()));
                        for (int i = 0; i < n; i++) {
                            add(cell, study.participants().get(included.get(i)), scores[i][m]);
                        }
                        if (subsampleScores != null) {
                            jackknife(cell, subsampleScores, m);
                        }
                        if (grandTrace != null) {
                            add(cell, MeasureTable.GRAND, measure.score(grandTrace, request.settings()));
                        }
                    }
                }
            }
        }

        /**
         * Only the samples the measures read are taken out: the windows and the largest reach
         * of any measure beyond them.
         */
        private int reach(TimeAxis full) {
            int reach = 0;
            for (Measure m : request.measures()) {
                reach = Math.max(reach, m.reachSamples(request.settings(), full.rateHz()));
            }
            return reach;
        }

        private int firstSampleRead(List<TimeWindow.SampleRange> windows, TimeAxis full) {
            int first = full.samples() - 1;
            for (TimeWindow.SampleRange r : windows) {
                first = Math.min(first, r.from());
            }
            return Math.max(0, first - reach(full));
        }

        private int lastSampleRead(List<TimeWindow.SampleRange> windows, TimeAxis full) {
            int last = 0;
            for (TimeWindow.SampleRange r : windows) {
                last = Math.max(last, r.to());
            }
            return Math.min(full.samples() - 1, last + reach(full));
        }

        private Score[][] scoreAll(List<Measure> measures, Trace[] traces) {
            Score[][] out = new Score[traces.length][measures.size()];
            for (int i = 0; i < traces.length; i++) {
                for (int m = 0; m < measures.size(); m++) {
                    out[i][m] = measures.get(m).score(traces[i], request.settings());
                }
            }
            return out;
        }

        private void jackknife(Cell cell, Score[][] subsampleScores, int measure) {
            int n = subsampleScores.length;
            double[] scores = new double[n];
            String qualifier = null;
            List<String> emptyFor = new ArrayList<>();
            List<String> qualifiedFor = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                Score s = subsampleScores[i][measure];
                scores[i] = s.value();
                String name = study.participants().get(included.get(i));
                if (s.isEmpty()) {
                    emptyFor.add(name);
                } else if (s.qualifier() != null) {
                    qualifier = s.qualifier();
                    qualifiedFor.add(name);
                }
            }
            if (!emptyFor.isEmpty()) {
                warn(cell, "jackknife", "the average without " + list(emptyFor) + " has no value,"
                        + " so no retrieved score can be formed; values left empty");
                for (int i = 0; i < n; i++) {
                    row(cell, study.participants().get(included.get(i)), null, true, Double.NaN);
                }
                return;
            }
            if (qualifier != null) {
                warn(cell, "jackknife", "the average without " + list(qualifiedFor) + " gave the "
                        + qualifier + " instead; every retrieved score is marked");
            }
            double[] retrieved = Jackknife.retrieve(scores);
            for (int i = 0; i < n; i++) {
                row(cell, study.participants().get(included.get(i)), qualifier, true, retrieved[i]);
            }
        }

        private void add(Cell cell, String participant, Score s) {
            if (s.warning() != null) {
                warn(cell, participant, s.warning());
            }
            row(cell, participant, s.qualifier(), false, s.value());
        }

        private void row(Cell cell, String participant, String qualifier, boolean jackknife, double value) {
            String measure = qualifier == null ? (jackknife ? cell.jackknifeName : cell.measure.name())
                    : cell.measure.name() + " (" + qualifier + ")"
                            + (jackknife ? MeasureTable.JACKKNIFE_SUFFIX : "");
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

    /** What the rows of one channel, measure and window share. */
    private static final class Cell {
        final String channel;
        final Measure measure;
        final TimeWindow window;
        final String unit;
        final String jackknifeName;

        Cell(String channel, Measure measure, TimeWindow window, String unit) {
            this.channel = channel;
            this.measure = measure;
            this.window = window;
            this.unit = unit;
            this.jackknifeName = measure.name() + MeasureTable.JACKKNIFE_SUFFIX;
        }
    }
}
