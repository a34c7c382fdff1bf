package org.meridian.sim;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Map;

/**
 * Writes a {@link GroundTruth} as JSON text ({@code truth.json} beside a simulated study): the
 * seed, the head model, the time axis, channels, noise, conditions, the nominal sources with
 * their time courses and spreads, and each participant's trial counts and actual source
 * positions, orientations, amplitude factors and latency shifts.
 *
 * <p>Numbers are written with a fixed number of decimals (trailing zeros dropped) through
 * {@link BigDecimal}, never through {@code Double.toString}, whose shortest-digit output changed
 * between Java versions; the text is therefore the same on every machine. Units are in the key
 * names: {@code _m} metres, {@code _ms} milliseconds, {@code _nam} nA·m, {@code _uv} µV.
 */
public final class TruthJson {
    private TruthJson() {
    }

    public static String of(GroundTruth truth) {
        Scenario s = truth.scenario();
        StringBuilder b = new StringBuilder(16_384);
        b.append("{\n");
        field(b, 1, "scenario", str(s.name()));
        field(b, 1, "seed", Long.toString(truth.seed()));
        field(b, 1, "head_model", "{\"kind\": \"homogeneous sphere\", \"radius_m\": "
                + num(s.head().radiusM(), 4) + ", \"conductivity_s_per_m\": "
                + num(s.head().conductivitySPerM(), 4) + ", \"series_tolerance\": "
                + sci(s.head().tolerance()) + "}");
        field(b, 1, "reference", str("average"));
        field(b, 1, "unit", str("uV"));
        field(b, 1, "time_axis", "{\"first_ms\": " + num(s.axis().firstMs(), 4) + ", \"rate_hz\": "
                + num(s.axis().rateHz(), 4) + ", \"samples\": " + s.axis().samples() + "}");
        field(b, 1, "channels", strings(s.montage().labels()));
        NoiseModel n = s.noise();
        field(b, 1, "noise", "{\"single_trial_rms_uv\": " + num(n.singleTrialRmsUv(), 4)
                + ", \"spectral_exponent\": " + num(n.exponent(), 4) + ", \"flat_below_hz\": "
                + num(n.lowHz(), 4) + ", \"sensor_fraction\": " + num(n.sensorFraction(), 4)
                + ", \"brain_noise_dipoles\": "
                + BackgroundNoise.brainDipolePositions(s.head().radiusM()).size() + "}");
        indent(b, 1).append("\"conditions\": [\n");
        for (int i = 0; i < s.conditions().size(); i++) {
            ConditionSpec c = s.conditions().get(i);
            indent(b, 2).append("{\"name\": ").append(str(c.name())).append(", \"trials_presented\": ")
                    .append(c.trialsPresented()).append(", \"min_kept_fraction\": ")
                    .append(num(c.minKeptFraction(), 4)).append('}')
                    .append(i + 1 < s.conditions().size() ? ",\n" : "\n");
        }
        indent(b, 1).append("],\n");
        indent(b, 1).append("\"sources\": [\n");
        for (int i = 0; i < s.sources().size(); i++) {
            source(b, s.sources().get(i), s.conditionNames());
            b.append(i + 1 < s.sources().size() ? ",\n" : "\n");
        }
        indent(b, 1).append("],\n");
        indent(b, 1).append("\"participants\": [\n");
        for (int i = 0; i < truth.participants().size(); i++) {
            participant(b, truth.participants().get(i), s.conditionNames());
            b.append(i + 1 < truth.participants().size() ? ",\n" : "\n");
        }
        indent(b, 1).append("]\n");
        b.append("}\n");
        return b.toString();
    }

    private static void source(StringBuilder b, Source s, List<String> conditions) {
        indent(b, 2).append("{\n");
        field(b, 3, "name", str(s.name()));
        field(b, 3, "position_m", vector(s.positionM(), 5));
        field(b, 3, "orientation", vector(s.orientation(), 4));
        indent(b, 3).append("\"components\": [");
        for (int k = 0; k < s.components().size(); k++) {
            TimeCourse c = s.components().get(k);
            b.append(k == 0 ? "\n" : ",\n");
            indent(b, 4).append("{\"kind\": ").append(str(c.kind()));
            for (Map.Entry<String, Double> e : c.parameters().entrySet()) {
                b.append(", ").append(str(e.getKey())).append(": ").append(num(e.getValue(), 4));
            }
            b.append('}');
        }
        b.append("\n");
        indent(b, 3).append("],\n");
        StringBuilder gains = new StringBuilder("{");
        for (int k = 0; k < conditions.size(); k++) {
            gains.append(k == 0 ? "" : ", ").append(str(conditions.get(k))).append(": ")
                    .append(num(s.gain(conditions.get(k)), 4));
        }
        field(b, 3, "gain", gains.append('}').toString());
        Variability v = s.variability();
        indent(b, 3).append("\"variability\": {\"amplitude_sd_log\": ").append(num(v.amplitudeSdLog(), 4))
                .append(", \"latency_sd_ms\": ").append(num(v.latencySdMs(), 3))
                .append(", \"position_sd_mm\": ").append(num(v.positionSdMm(), 3))
                .append(", \"orientation_sd_deg\": ").append(num(v.orientationSdDeg(), 3)).append("}\n");
        indent(b, 2).append('}');
    }

    private static void participant(StringBuilder b, GroundTruth.ParticipantTruth p,
            List<String> conditions) {
        indent(b, 2).append("{\n");
        field(b, 3, "name", str(p.name()));
        StringBuilder trials = new StringBuilder("{");
        for (int k = 0; k < conditions.size(); k++) {
            trials.append(k == 0 ? "" : ", ").append(str(conditions.get(k))).append(": ")
                    .append(p.trials().get(k));
        }
        field(b, 3, "trials", trials.append('}').toString());
        indent(b, 3).append("\"sources\": [\n");
        for (int k = 0; k < p.sources().size(); k++) {
            GroundTruth.SourceDraw d = p.sources().get(k);
            indent(b, 4).append("{\"name\": ").append(str(d.source()))
                    .append(", \"position_m\": ").append(vector(d.positionM(), 5))
                    .append(", \"orientation\": ").append(vector(d.orientation(), 4))
                    .append(", \"amplitude_factor\": ").append(num(d.amplitudeFactor(), 4))
                    .append(", \"latency_shift_ms\": ").append(num(d.latencyShiftMs(), 2)).append('}')
                    .append(k + 1 < p.sources().size() ? ",\n" : "\n");
        }
        indent(b, 3).append("]\n");
        indent(b, 2).append('}');
    }

    private static void field(StringBuilder b, int level, String key, String value) {
        indent(b, level).append(str(key)).append(": ").append(value).append(",\n");
    }

    private static StringBuilder indent(StringBuilder b, int level) {
        for (int i = 0; i < level; i++) {
            b.append("  ");
        }
        return b;
    }

    private static String vector(Vector3 v, int decimals) {
        return "[" + num(v.x(), decimals) + ", " + num(v.y(), decimals) + ", " + num(v.z(), decimals) + "]";
    }

    private static String strings(List<String> items) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < items.size(); i++) {
            sb.append(i == 0 ? "" : ", ").append(str(items.get(i)));
        }
        return sb.append(']').toString();
    }

    /** A number rounded half-even to {@code decimals} places, trailing zeros dropped, no exponent. */
    static String num(double v, int decimals) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("JSON has no " + v);
        }
        BigDecimal d = new BigDecimal(v).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros();
        if (d.signum() == 0) {
            return "0";
        }
        return d.scale() < 0 ? d.setScale(0).toPlainString() : d.toPlainString();
    }

    /** A small positive number such as a tolerance, as {@code 1e-10}. */
    static String sci(double v) {
        int exponent = (int) Math.floor(StrictMath.log10(v));
        double mantissa = v / StrictMath.pow(10, exponent);
        return num(mantissa, 3) + "e" + exponent;
    }

    static String str(String s) {
        StringBuilder sb = new StringBuilder("\"");
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            switch (ch) {
                case '"' -> sb.append("\\\"");
                case '\\' -> sb.append("\\\\");
                case '\n' -> sb.append("\\n");
                case '\r' -> sb.append("\\r");
                case '\t' -> sb.append("\\t");
                default -> {
                    if (ch < 0x20) {
                        sb.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) ch));
                    } else {
                        sb.append(ch);
                    }
                }
            }
        }
        return sb.append('"').toString();
    }
}
