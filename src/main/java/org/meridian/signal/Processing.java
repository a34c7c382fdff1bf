package org.meridian.signal;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.meridian.core.BadInputException;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.montage.ChannelPositions;

/**
 * What is done to every participant × condition average before anything is computed from it:
 * the recording reference put back as a zero channel, a new reference, a zero-phase Butterworth
 * filter and a baseline correction, each optional. Nothing is ever applied unless asked for, and
 * every view, table or figure made from processed data states it with {@link #describe()}.
 *
 * <p><b>Order.</b> The steps run in the order (1) restore the omitted reference, (2) re-reference,
 * (3) filter, (4) subtract the baseline. Steps 2 and 3 commute (one mixes channels at each sample,
 * the other mixes samples of each channel; both are linear), and so do 2 and 4. The filter and the
 * baseline do not: a high-pass moves the baseline level, so the baseline is taken last, on the data
 * as they will be shown or measured (common practice). Every step is linear, so processing each
 * participant's average and then forming contrasts and grand averages gives the same waves as
 * processing those combinations — but only per-cell processing is well defined for a channel
 * reference that a contrast would cancel, so {@link #apply(Study)} works cell by cell.
 *
 * <p><b>The average reference</b> is the mean of the channels with a scalp position; channels
 * without one (EOG, say) are left out of the mean but still re-referenced, so a bipolar EOG
 * derivation does not leak into the scalp data. When no channel has a position, the mean of all
 * channels is used. {@link ReferenceChoice#averageOfAll()} takes every channel. A restored
 * reference channel always joins the mean: it is a scalp site by construction.
 *
 * <p>Immutable; build one from {@link #none()} with the {@code with…} methods.
 */
public final class Processing {
    /** Filter order used when a cut-off is given without an order: 4 per pass (common practice). */
    public static final int DEFAULT_FILTER_ORDER = 4;

    private static final Processing NONE = new Processing(null, ReferenceChoice.NONE, null, Double.NaN,
            Double.NaN, DEFAULT_FILTER_ORDER);

    private final String restoredReference;
    private final ReferenceChoice reference;
    private final BaselineChoice baseline;
    private final double lowPassHz;
    private final double highPassHz;
    private final int filterOrder;

    private Processing(String restoredReference, ReferenceChoice reference, BaselineChoice baseline,
            double lowPassHz, double highPassHz, int filterOrder) {
        this.restoredReference = restoredReference;
        this.reference = Objects.requireNonNull(reference);
        this.baseline = baseline;
        this.lowPassHz = lowPassHz;
        this.highPassHz = highPassHz;
        this.filterOrder = filterOrder;
        // validates cut-offs and order now, not when the first study arrives
        filter();
    }

    /** Nothing at all: {@link #apply(Study)} returns its argument. */
    public static Processing none() {
        return NONE;
    }

    /** Puts back the channel the recording was referenced to, as zeros, under this label. */
    public Processing withRestoredReference(String label) {
        String l = label == null || label.isBlank() ? null : label.trim();
        return new Processing(l, reference, baseline, lowPassHz, highPassHz, filterOrder);
    }

    public Processing withReference(ReferenceChoice choice) {
        return new Processing(restoredReference, choice, baseline, lowPassHz, highPassHz, filterOrder);
    }

    /** Subtracts each channel's mean over this window; null for no baseline correction. */
    public Processing withBaseline(BaselineChoice choice) {
        return new Processing(restoredReference, reference, choice, lowPassHz, highPassHz, filterOrder);
    }

    /** A low-pass cut-off in Hz, or NaN for none. */
    public Processing withLowPass(double hz) {
        return new Processing(restoredReference, reference, baseline, hz, highPassHz, filterOrder);
    }

    /** A high-pass cut-off in Hz, or NaN for none. With a low-pass as well the filter is a band-pass. */
    public Processing withHighPass(double hz) {
        return new Processing(restoredReference, reference, baseline, lowPassHz, hz, filterOrder);
    }

    /** The Butterworth order of each pass (1..{@value ButterworthFilter#MAX_ORDER}). */
    public Processing withFilterOrder(int order) {
        return new Processing(restoredReference, reference, baseline, lowPassHz, highPassHz, order);
    }

    public Optional<String> restoredReference() {
        return Optional.ofNullable(restoredReference);
    }

    public ReferenceChoice reference() {
        return reference;
    }

    public Optional<BaselineChoice> baseline() {
        return Optional.ofNullable(baseline);
    }

    /** The low-pass cut-off in Hz, NaN when there is none. */
    public double lowPassHz() {
        return lowPassHz;
    }

    /** The high-pass cut-off in Hz, NaN when there is none. */
    public double highPassHz() {
        return highPassHz;
    }

    public int filterOrder() {
        return filterOrder;
    }

    /** The filter asked for, if any. */
    public Optional<ButterworthFilter> filter() {
        boolean low = !Double.isNaN(lowPassHz);
        boolean high = !Double.isNaN(highPassHz);
        if (low && high) {
            return Optional.of(ButterworthFilter.bandPass(filterOrder, highPassHz, lowPassHz));
        } else if (low) {
            return Optional.of(ButterworthFilter.lowPass(filterOrder, lowPassHz));
        } else if (high) {
            return Optional.of(ButterworthFilter.highPass(filterOrder, highPassHz));
        }
        if (filterOrder < 1 || filterOrder > ButterworthFilter.MAX_ORDER) {
            throw new BadInputException("filter order must be 1.." + ButterworthFilter.MAX_ORDER
                    + ", got " + filterOrder);
        }
        return Optional.empty();
    }

    /** True when nothing is done to the data. */
    public boolean isNone() {
        return restoredReference == null && reference == ReferenceChoice.NONE && baseline == null
                && filter().isEmpty();
    }

    /**
     * A short caption in the order the steps run, e.g. {@code average reference; low-pass 30 Hz,
     * Butterworth order 4, zero-phase; baseline -200:0 ms}; {@code none} when nothing is done.
     */
    public String describe() {
        List<String> parts = new ArrayList<>();
        if (restoredReference != null) {
            parts.add(restoredReference + " restored as the zero reference channel");
        }
        if (reference != ReferenceChoice.NONE) {
            parts.add(reference.describe());
        }
        filter().ifPresent(f -> parts.add(f.describe()));
        if (baseline != null) {
            parts.add(baseline.describe());
        }
        return parts.isEmpty() ? "none" : String.join("; ", parts);
    }

    @Override
    public String toString() {
        return describe();
    }

    /**
     * Processes every participant × condition average of a study. The study keeps its name,
     * participants, conditions and trial counts; a restored reference channel is added to the
     * channels (and to the montage when its label is a standard position).
     */
    public Study apply(Study study) {
        if (isNone()) {
            return study;
        }
        Set<String> leftOut = new LinkedHashSet<>(study.unpositionedChannels());
        Study.Builder b = Study.builder(study.name());
        Montage montage = study.montage();
        List<ChannelPlacement> placements = new ArrayList<>(study.placements());
        if (restoredReference != null) {
            if (study.waveforms(0, 0).indexOf(restoredReference) >= 0) {
                throw new BadInputException("the omitted reference " + restoredReference
                        + " is already a channel of the data");
            }
            ChannelPositions.Resolution r = ChannelPositions.resolve(List.of(restoredReference), null);
            List<Electrode> electrodes = new ArrayList<>(montage.electrodes());
            electrodes.addAll(r.montage().electrodes());
            montage = new Montage(electrodes, montage.source());
            placements.addAll(r.placements());
        }
        b.montage(montage).placements(placements).inputFiles(study.inputFiles());
        for (int p = 0; p < study.participants().size(); p++) {
            for (int c = 0; c < study.conditions().size(); c++) {
                b.add(study.participants().get(p), study.conditions().get(c),
                        apply(study.waveforms(p, c), leftOut), study.trials(p, c).orElse(-1));
            }
        }
        return b.build();
    }

    /**
     * Processes one average.
     *
     * @param unpositioned channels without a scalp position, left out of the average reference's
     *                     mean (still re-referenced)
     */
    public Waveforms apply(Waveforms w, Collection<String> unpositioned) {
        Waveforms out = w;
        if (restoredReference != null) {
            out = Reference.restoreOmitted(out, restoredReference);
        }
        Reference r = reference.toReference(out, unpositioned);
        if (r != null) {
            out = r.apply(out);
        }
        Optional<ButterworthFilter> f = filter();
        if (f.isPresent()) {
            out = f.get().applyZeroPhase(out);
        }
        if (baseline != null) {
            out = baseline.apply(out);
        }
        return out;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Processing p && Objects.equals(restoredReference, p.restoredReference)
                && reference.equals(p.reference) && Objects.equals(baseline, p.baseline)
                && Double.compare(lowPassHz, p.lowPassHz) == 0 && Double.compare(highPassHz, p.highPassHz) == 0
                && (filterOrder == p.filterOrder || filter().isEmpty() && p.filter().isEmpty());
    }

    @Override
    public int hashCode() {
        return Objects.hash(restoredReference, reference, baseline, lowPassHz, highPassHz,
                filter().isPresent() ? filterOrder : 0);
    }

    /**
     * The reference to re-reference to: none (keep the recording's), the average, or the mean of
     * one or more channels. Written {@code none}, {@code average}, {@code average-all},
     * {@code Cz} or {@code M1+M2}.
     *
     * @param kind     which reference
     * @param channels the channels whose mean is the reference (kind CHANNELS only)
     */
    public record ReferenceChoice(Kind kind, List<String> channels) {
        public enum Kind {
            NONE, AVERAGE, AVERAGE_OF_ALL, CHANNELS
        }

        public static final ReferenceChoice NONE = new ReferenceChoice(Kind.NONE, List.of());

        public ReferenceChoice {
            Objects.requireNonNull(kind);
            channels = channels == null ? List.of() : List.copyOf(channels);
            if (kind == Kind.CHANNELS && channels.isEmpty()) {
                throw new BadInputException("a channel reference needs at least one channel");
            }
            if (kind != Kind.CHANNELS && !channels.isEmpty()) {
                throw new IllegalArgumentException("only a channel reference lists channels");
            }
        }

        public static ReferenceChoice average() {
            return new ReferenceChoice(Kind.AVERAGE, List.of());
        }

        public static ReferenceChoice averageOfAll() {
            return new ReferenceChoice(Kind.AVERAGE_OF_ALL, List.of());
        }

        public static ReferenceChoice channels(List<String> labels) {
            return new ReferenceChoice(Kind.CHANNELS, labels);
        }

        /** Reads {@code none}, {@code average} ({@code avg}), {@code average-all}, {@code Cz}, {@code M1+M2}. */
        public static ReferenceChoice parse(String text) {
            String t = text == null ? "" : text.trim();
            String lower = t.toLowerCase(Locale.ROOT);
            switch (lower) {
                case "", "none" -> {
                    return NONE;
                }
                case "average-all", "avg-all" -> {
                    return averageOfAll();
                }
                default -> {
                    // Reference.parse reads average and channel lists and names a malformed one
                    Reference r = Reference.parse(t);
                    return r instanceof Reference.Channels c ? channels(c.labels()) : average();
                }
            }
        }

        /** The written form that {@link #parse} reads back. */
        public String text() {
            return switch (kind) {
                case NONE -> "none";
                case AVERAGE -> "average";
                case AVERAGE_OF_ALL -> "average-all";
                case CHANNELS -> String.join("+", channels);
            };
        }

        /** E.g. {@code average reference}, {@code reference Cz}, {@code reference mean of M1+M2}. */
        public String describe() {
            return switch (kind) {
                case NONE -> "recording reference";
                case AVERAGE -> "average reference";
                case AVERAGE_OF_ALL -> "average reference (all channels)";
                case CHANNELS -> channels.size() == 1 ? "reference " + channels.get(0)
                        : "reference mean of " + String.join("+", channels);
            };
        }

        /** The reference for these data, or null for none. */
        Reference toReference(Waveforms w, Collection<String> unpositioned) {
            return switch (kind) {
                case NONE -> null;
                case AVERAGE_OF_ALL -> Reference.average();
                case CHANNELS -> Reference.channels(channels);
                case AVERAGE -> {
                    Set<String> leftOut = new LinkedHashSet<>();
                    for (String l : unpositioned) {
                        if (w.indexOf(l) >= 0) {
                            leftOut.add(l);
                        }
                    }
                    yield leftOut.size() >= w.channelCount() ? Reference.average()
                            : Reference.averageWithout(leftOut);
                }
            };
        }
    }

    /**
     * The baseline window: every sample before 0 ms, or a window {@code A:B} in ms.
     *
     * @param window the window, or null for the samples before 0 ms
     */
    public record BaselineChoice(TimeWindow window) {

        public static BaselineChoice preStimulus() {
            return new BaselineChoice(null);
        }

        public static BaselineChoice of(TimeWindow window) {
            return new BaselineChoice(Objects.requireNonNull(window));
        }

        /** Reads {@code pre} (the samples before 0 ms) or {@code A:B} in ms. */
        public static BaselineChoice parse(String text) {
            String t = text == null ? "" : text.trim();
            return t.equalsIgnoreCase("pre") ? preStimulus() : of(TimeWindow.parse(t));
        }

        /** The written form that {@link #parse} reads back. */
        public String text() {
            return window == null ? "pre" : window.toString();
        }

        /** E.g. {@code baseline -200:0 ms} or {@code baseline before 0 ms}. */
        public String describe() {
            return window == null ? "baseline before 0 ms" : "baseline " + window + " ms";
        }

        Waveforms apply(Waveforms w) {
            return window == null ? Baseline.preStimulus(w) : Baseline.correct(w, window);
        }
    }
}
