package org.meridian.signal;

/**
 * A digital IIR filter as a cascade of second-order sections ("biquads"), each
 * H_k(z) = (b0 + b1 z⁻¹ + b2 z⁻²) / (1 + a1 z⁻¹ + a2 z⁻²), run in transposed direct form II in
 * double precision. A first-order section has b2 = a2 = 0. Cascading second-order sections
 * keeps high orders and low cut-offs numerically stable (Oppenheim &amp; Schafer, Discrete-Time
 * Signal Processing, ch. 6). Immutable.
 */
public final class SecondOrderSections {
    private final double[][] sections;

    /** Each row is {b0, b1, b2, a1, a2} (a0 = 1); the rows are copied. */
    public SecondOrderSections(double[][] sections) {
        if (sections.length == 0) {
            throw new IllegalArgumentException("a filter needs at least one section");
        }
        this.sections = new double[sections.length][];
        for (int k = 0; k < sections.length; k++) {
            if (sections[k].length != 5) {
                throw new IllegalArgumentException("section " + k + " needs 5 coefficients");
            }
            for (double v : sections[k]) {
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("section " + k + " has a non-finite coefficient");
                }
            }
            this.sections[k] = sections[k].clone();
        }
    }

    public int sectionCount() {
        return sections.length;
    }

    /** The cascade followed by another one. */
    public SecondOrderSections then(SecondOrderSections next) {
        double[][] all = new double[sections.length + next.sections.length][];
        System.arraycopy(sections, 0, all, 0, sections.length);
        System.arraycopy(next.sections, 0, all, sections.length, next.sections.length);
        return new SecondOrderSections(all);
    }

    /**
     * |H(e^{iω})|² at a frequency, with ω = 2π f / rate: the power gain of one pass.
     */
    public double powerGain(double frequencyHz, double rateHz) {
        double w = 2 * Math.PI * frequencyHz / rateHz;
        double c1 = Math.cos(w);
        double s1 = -Math.sin(w);
        double c2 = Math.cos(2 * w);
        double s2 = -Math.sin(2 * w);
        double gain = 1;
        for (double[] q : sections) {
            double nr = q[0] + q[1] * c1 + q[2] * c2;
            double ni = q[1] * s1 + q[2] * s2;
            double dr = 1 + q[3] * c1 + q[4] * c2;
            double di = q[3] * s1 + q[4] * s2;
            gain *= (nr * nr + ni * ni) / (dr * dr + di * di);
        }
        return gain;
    }

    /**
     * Filters {@code x} in place, forward in time. The state starts in the steady state the
     * cascade would have reached after a constant input equal to {@code x[0]},
     * so a signal that starts away from zero does not produce a start-up transient.
     */
    void filterInPlace(double[] x) {
        if (x.length == 0) {
            return;
        }
        double level = x[0];
        for (double[] q : sections) {
            double b0 = q[0];
            double b1 = q[1];
            double b2 = q[2];
            double a1 = q[3];
            double a2 = q[4];
            double gain = (b0 + b1 + b2) / (1 + a1 + a2);
            double settled = gain * level;
            double z1 = settled - b0 * level;
            double z2 = b2 * level - a2 * settled;
            for (int i = 0; i < x.length; i++) {
                double in = x[i];
                double out = b0 * in + z1;
                z1 = b1 * in - a1 * out + z2;
                z2 = b2 * in - a2 * out;
                x[i] = out;
            }
            level = settled;
        }
    }
}
