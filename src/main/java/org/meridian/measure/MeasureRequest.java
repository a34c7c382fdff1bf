package org.meridian.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.meridian.core.BadInputException;
import org.meridian.signal.ConditionWave;
import org.meridian.signal.GrandAverage;
import org.meridian.signal.TimeWindow;

/**
 * What to measure: conditions (loaded, contrasts or lateralised waves), channels and regions
 * (none given: every channel of each wave), windows, measures and their settings, and which rows
 * the table gets besides the participants' own: the grand average's ({@code grand}) and the
 * jackknife's retrieved scores ({@code jackknife}). Immutable; build with {@link #builder()}.
 */
public record MeasureRequest(List<ConditionWave> conditions, List<String> channels,
        List<TimeWindow> windows, List<Measure> measures, MeasureSettings settings, boolean grand,
        boolean jackknife, GrandAverage.Weighting weighting, Set<String> excluded) {

    public MeasureRequest {
        conditions = List.copyOf(conditions);
        channels = List.copyOf(channels);
        windows = List.copyOf(windows);
        measures = List.copyOf(measures);
        excluded = Set.copyOf(excluded);
        if (conditions.isEmpty()) {
            throw new BadInputException("nothing to measure: no condition given");
        }
        if (windows.isEmpty()) {
            throw new BadInputException("nothing to measure: no window given");
        }
        if (measures.isEmpty()) {
            throw new BadInputException("nothing to measure: no measure given");
        }
        for (Measure m : measures) {
            m.check(settings);
        }
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Collects a request; defaults: every channel, default settings, participant rows only. */
    public static final class Builder {
        private final List<ConditionWave> conditions = new ArrayList<>();
        private final List<String> channels = new ArrayList<>();
        private final List<TimeWindow> windows = new ArrayList<>();
        private final List<Measure> measures = new ArrayList<>();
        private MeasureSettings settings = MeasureSettings.defaults();
        private boolean grand;
        private boolean jackknife;
        private GrandAverage.Weighting weighting = GrandAverage.Weighting.UNWEIGHTED;
        private Set<String> excluded = Set.of();

        public Builder condition(ConditionWave c) {
            conditions.add(c);
            return this;
        }

        /** A channel label or a region such as {@code P3+Pz+P4}. */
        public Builder channel(String channelOrRegion) {
            channels.add(channelOrRegion);
            return this;
        }

        public Builder window(TimeWindow w) {
            windows.add(w);
            return this;
        }

        public Builder measure(Measure m) {
            measures.add(m);
            return this;
        }

        public Builder measure(String name) {
            return measure(Measures.byName(name));
        }

        public Builder settings(MeasureSettings s) {
            settings = s;
            return this;
        }

        public Builder grand(boolean on) {
            grand = on;
            return this;
        }

        public Builder jackknife(boolean on) {
            jackknife = on;
            return this;
        }

        public Builder weighting(GrandAverage.Weighting w) {
            weighting = w;
            return this;
        }

        public Builder excluded(Set<String> participants) {
            excluded = participants;
            return this;
        }

        public MeasureRequest build() {
            return new MeasureRequest(conditions, channels, windows, measures, settings, grand,
                    jackknife, weighting, excluded);
        }
    }
}
