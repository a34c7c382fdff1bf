package org.meridian.cli;

import java.io.PrintWriter;
import java.util.List;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.signal.Baseline;
import org.meridian.signal.ButterworthFilter;
import org.meridian.signal.Processing;
import org.meridian.signal.Processing.BaselineChoice;
import org.meridian.signal.Processing.ReferenceChoice;
import picocli.CommandLine.Option;

/**
 * The waveform processing options shared by {@code measure}, {@code maps} and {@code span}
 * ({@link Processing}): restore an omitted recording reference, re-reference, and filter, each
 * applied to every participant × condition average before anything else is computed. Nothing is
 * applied unless asked for. The baseline option lives in {@link WithBaseline} because
 * {@code measure} declares its own.
 */
class ProcessingOptions {
    @Option(names = "--restore-reference", paramLabel = "LABEL",
            description = "Put the recording reference the files left out back as a channel of zeros, "
                    + "under this label (before re-referencing).")
    String restoreReference;

    @Option(names = "--reference", paramLabel = "REF",
            description = "Re-reference: average (channels with a scalp position; EOG and other "
                    + "unpositioned channels are left out of the mean), average-all, a channel (Cz), "
                    + "or the mean of channels (TP9+TP10); default: keep the recording's.")
    String reference;

    @Option(names = "--low-pass", paramLabel = "HZ",
            description = "Zero-phase Butterworth low-pass cut-off (the -6 dB point after both passes).")
    Double lowPassHz;

    @Option(names = "--high-pass", paramLabel = "HZ",
            description = "Zero-phase Butterworth high-pass cut-off; with --low-pass, a band-pass.")
    Double highPassHz;

    @Option(names = "--filter-order", paramLabel = "N", defaultValue = "" + Processing.DEFAULT_FILTER_ORDER,
            description = "Butterworth order of each pass, 1-" + ButterworthFilter.MAX_ORDER
                    + " (default ${DEFAULT-VALUE}).")
    int filterOrder;

    /** The baseline option's text, or null; only {@link WithBaseline} has one. */
    String baselineText() {
        return null;
    }

    /** The processing asked for; a bad value is an error naming its option. */
    Processing processing() {
        Processing p = OptionErrors.about("--restore-reference",
                () -> Processing.none().withRestoredReference(restoreReference));
        p = withReference(p);
        p = withFilter(p);
        String b = baselineText();
        if (b != null) {
            Processing before = p;
            p = OptionErrors.about("--baseline", () -> before.withBaseline(BaselineChoice.parse(b)));
        }
        return p;
    }

    /**
     * Processes every average of a study, after checking each option against it (so an error
     * names the option at fault), and says on {@code note} what was done.
     */
    Study apply(Study study, PrintWriter note) {
        Processing p = processing();
        if (p.isNone()) {
            return study;
        }
        check(p, study);
        Study out = p.apply(study);
        if (note != null) {
            note.println("processing: " + p.describe());
        }
        return out;
    }

    /**
     * A comment line for a table, {@code # processing: …} and a line end, naming what was applied
     * (including a baseline given by the command's own option); empty when nothing was.
     */
    String commentLine(String ownBaseline) {
        Processing p = processing();
        if (ownBaseline != null) {
            Processing before = p;
            p = OptionErrors.about("--baseline", () -> before.withBaseline(BaselineChoice.parse(ownBaseline)));
        }
        return p.isNone() ? "" : "# processing: " + p.describe() + "\n";
    }

    private Processing withReference(Processing p) {
        if (reference == null) {
            return p;
        }
        return OptionErrors.about("--reference", () -> p.withReference(ReferenceChoice.parse(reference)));
    }

    private Processing withFilter(Processing p) {
        Processing ordered = OptionErrors.about("--filter-order", () -> p.withFilterOrder(filterOrder));
        Processing low = lowPassHz == null ? ordered
                : OptionErrors.about("--low-pass", () -> ordered.withLowPass(lowPassHz));
        return highPassHz == null ? low : OptionErrors.about("--high-pass", () -> low.withHighPass(highPassHz));
    }

    /** Checks what depends on the data, naming the option: channels, cut-offs, the baseline window. */
    private void check(Processing p, Study study) {
        List<String> labels = study.channelLabels();
        if (p.restoredReference().isPresent()) {
            String l = p.restoredReference().get();
            if (labels.stream().anyMatch(x -> x.equalsIgnoreCase(l))) {
                throw new BadInputException("option --restore-reference: " + l
                        + " is already a channel of the data");
            }
        }
        for (String ch : p.reference().channels()) {
            boolean restored = p.restoredReference().map(ch::equalsIgnoreCase).orElse(false);
            if (!restored && labels.stream().noneMatch(ch::equalsIgnoreCase)) {
                throw new BadInputException("option --reference: channel " + ch + " is not in the data;"
                        + " if it was the recording reference, give --restore-reference " + ch);
            }
        }
        double rate = study.axis().rateHz();
        if (lowPassHz != null) {
            OptionErrors.about("--low-pass", () -> ButterworthFilter.lowPass(filterOrder, lowPassHz).design(rate));
        }
        if (highPassHz != null) {
            OptionErrors.about("--high-pass", () -> ButterworthFilter.highPass(filterOrder, highPassHz).design(rate));
        }
        p.baseline().ifPresent(b -> OptionErrors.about("--baseline", () -> b.window() == null
                ? Baseline.preStimulus(study.waveforms(0, 0))
                : b.window().resolve(study.axis())));
    }

    /** The processing options with a baseline, for commands that have none of their own. */
    static final class WithBaseline extends ProcessingOptions {
        @Option(names = "--baseline", paramLabel = "A:B|pre",
                description = "Subtract each channel's mean over this window, after filtering "
                        + "('pre': every sample before 0 ms); default: none.")
        String baseline;

        @Override
        String baselineText() {
            return baseline;
        }
    }
}
