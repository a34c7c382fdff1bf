package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import org.meridian.core.BadInputException;
import org.meridian.signal.Processing;
import org.meridian.signal.Processing.BaselineChoice;
import org.meridian.signal.Processing.ReferenceChoice;

/**
 * What is done to every participant × condition average of the figure's study before anything
 * is drawn ({@link Processing}, steps in the order restore, reference, filter, baseline), each
 * field optional: {@code restore_reference} (the label of the omitted recording reference, put
 * back as zeros), {@code reference} ({@code average}, {@code average-all}, {@code Cz},
 * {@code TP9+TP10}), {@code low_pass_hz} and {@code high_pass_hz} (zero-phase Butterworth; both
 * give a band-pass), {@code filter_order} (per pass, default 4) and {@code baseline}
 * ({@code pre} or {@code "-200:0"}). The figure states it in a caption line whenever it does
 * something. Immutable.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
@JsonPropertyOrder({"restore_reference", "reference", "low_pass_hz", "high_pass_hz", "filter_order", "baseline"})
public record ProcessingSpec(@JsonProperty("restore_reference") String restoreReference,
        @JsonProperty("reference") String reference,
        @JsonProperty("low_pass_hz") Double lowPassHz,
        @JsonProperty("high_pass_hz") Double highPassHz,
        @JsonProperty("filter_order") Integer filterOrder,
        @JsonProperty("baseline") String baseline) {

    public ProcessingSpec {
        // every mistake is found on reading, naming the field
        processing(restoreReference, reference, lowPassHz, highPassHz, filterOrder, baseline);
    }

    /** The spec form of a processing value, or null when it does nothing. */
    public static ProcessingSpec of(Processing p) {
        if (p == null || p.isNone()) {
            return null;
        }
        boolean filtered = p.filter().isPresent();
        return new ProcessingSpec(p.restoredReference().orElse(null),
                p.reference().kind() == ReferenceChoice.Kind.NONE ? null : p.reference().text(),
                Double.isNaN(p.lowPassHz()) ? null : p.lowPassHz(),
                Double.isNaN(p.highPassHz()) ? null : p.highPassHz(),
                filtered ? p.filterOrder() : null,
                p.baseline().map(BaselineChoice::text).orElse(null));
    }

    /** The processing this spec asks for. */
    public Processing toProcessing() {
        return processing(restoreReference, reference, lowPassHz, highPassHz, filterOrder, baseline);
    }

    private static Processing processing(String restore, String reference, Double low, Double high,
            Integer order, String baseline) {
        Processing p = about("restore_reference", () -> Processing.none().withRestoredReference(restore));
        if (reference != null) {
            Processing before = p;
            p = about("reference", () -> before.withReference(ReferenceChoice.parse(reference)));
        }
        if (order != null) {
            Processing before = p;
            p = about("filter_order", () -> before.withFilterOrder(order));
        }
        if (low != null) {
            Processing before = p;
            p = about("low_pass_hz", () -> before.withLowPass(low));
        }
        if (high != null) {
            Processing before = p;
            p = about("high_pass_hz", () -> before.withHighPass(high));
        }
        if (baseline != null) {
            Processing before = p;
            p = about("baseline", () -> before.withBaseline(BaselineChoice.parse(baseline)));
        }
        return p;
    }

    private static Processing about(String field, java.util.function.Supplier<Processing> step) {
        try {
            return step.get();
        } catch (BadInputException e) {
            throw new BadInputException("processing." + field + ": " + e.getMessage(), e);
        }
    }
}
