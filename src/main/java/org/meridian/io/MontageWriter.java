package org.meridian.io;

import java.util.Locale;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

/** Writes a montage as the TSV of DESIGN §4: a header {@code label x y z}, one electrode a row. */
public final class MontageWriter {
    private MontageWriter() {
    }

    /** The montage as TSV text with six decimals, LF line ends. */
    public static String toTsv(Montage montage) {
        StringBuilder sb = new StringBuilder();
        sb.append("# ").append(montage.source())
                .append(": unit sphere, +x right ear, +y nose, +z up\n");
        sb.append("label\tx\ty\tz\n");
        for (Electrode e : montage.electrodes()) {
            sb.append(e.label()).append('\t').append(fixed(e.x())).append('\t')
                    .append(fixed(e.y())).append('\t').append(fixed(e.z())).append('\n');
        }
        return sb.toString();
    }

    private static String fixed(double v) {
        String s = String.format(Locale.ROOT, "%.6f", v);
        return s.equals("-0.000000") ? "0.000000" : s;
    }
}
