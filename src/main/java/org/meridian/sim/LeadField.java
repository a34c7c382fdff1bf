package org.meridian.sim;

import java.util.List;

/**
 * The lead field of one dipole position for one montage: for each channel, the potential in µV
 * produced by a moment of 1 nA·m along x, y and z. The potential of any moment p there is
 * Σ_k p_k · gain_k, so the scalp map of a source is one small matrix–vector product. Immutable.
 */
public final class LeadField {
    private final List<String> labels;
    private final double[] gains;

    LeadField(List<String> labels, double[] gains) {
        if (gains.length != 3 * labels.size()) {
            throw new IllegalArgumentException("expected " + 3 * labels.size() + " gains, got "
                    + gains.length);
        }
        this.labels = List.copyOf(labels);
        this.gains = gains.clone();
    }

    public List<String> labels() {
        return labels;
    }

    public int channelCount() {
        return labels.size();
    }

    /** The potential (µV per nA·m) at one channel for unit moments along x, y and z. */
    public Vector3 gain(int channel) {
        return new Vector3(gains[3 * channel], gains[3 * channel + 1], gains[3 * channel + 2]);
    }

    /** The scalp map in µV (one value per channel) of a moment in nA·m. */
    public double[] map(Vector3 momentNAm) {
        double[] out = new double[labels.size()];
        for (int c = 0; c < out.length; c++) {
            out[c] = momentNAm.x() * gains[3 * c] + momentNAm.y() * gains[3 * c + 1]
                    + momentNAm.z() * gains[3 * c + 2];
        }
        return out;
    }
}
