package org.meridian.maps;

/**
 * Conversions between sRGB, CIELAB and the Msh coordinates of Moreland (2009).
 *
 * <ul>
 *   <li>sRGB ↔ linear RGB ↔ CIE XYZ: IEC 61966-2-1 (the sRGB standard), D65 white.
 *   <li>XYZ ↔ CIELAB: CIE 1976 L*a*b* with the D65 reference white (0.95047, 1, 1.08883).
 *   <li>Msh (Moreland, 2009, "Diverging color maps for scientific visualization"): the polar
 *       form of CIELAB in three dimensions, M = √(L² + a² + b²), s = arccos(L / M) (saturation as
 *       an angle from the lightness axis), h = atan2(b, a).
 * </ul>
 *
 * Colours are packed {@code 0xRRGGBB}; arrays are {L, a, b} or {M, s, h}. Out-of-gamut colours are
 * clamped channel by channel.
 */
public final class ColourSpace {
    private static final double XN = 0.95047;
    private static final double YN = 1.0;
    private static final double ZN = 1.08883;
    private static final double EPSILON = 216.0 / 24389;
    private static final double KAPPA = 24389.0 / 27;

    private ColourSpace() {
    }

    /** CIELAB of an sRGB colour. */
    public static double[] srgbToLab(int rgb) {
        double r = toLinear((rgb >> 16) & 0xff);
        double g = toLinear((rgb >> 8) & 0xff);
        double b = toLinear(rgb & 0xff);
        double x = 0.4124564 * r + 0.3575761 * g + 0.1804375 * b;
        double y = 0.2126729 * r + 0.7151522 * g + 0.0721750 * b;
        double z = 0.0193339 * r + 0.1191920 * g + 0.9503041 * b;
        double fx = f(x / XN);
        double fy = f(y / YN);
        double fz = f(z / ZN);
        return new double[] {116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)};
    }

    /** The linear RGB (0–1, unclamped) of a CIELAB colour. */
    public static double[] labToLinearRgb(double[] lab) {
        double fy = (lab[0] + 16) / 116;
        double fx = fy + lab[1] / 500;
        double fz = fy - lab[2] / 200;
        double x = fInverse(fx) * XN;
        double y = fInverse(fy) * YN;
        double z = fInverse(fz) * ZN;
        return new double[] {
            3.2404542 * x - 1.5371385 * y - 0.4985314 * z,
            -0.9692660 * x + 1.8760108 * y + 0.0415560 * z,
            0.0556434 * x - 0.2040259 * y + 1.0572252 * z,
        };
    }

    /** The sRGB colour of a CIELAB colour, clamped into the gamut. */
    public static int labToSrgb(double[] lab) {
        return linearToSrgb(labToLinearRgb(lab));
    }

    /** Packs linear RGB (clamped to 0–1) as an sRGB colour. */
    public static int linearToSrgb(double[] linear) {
        return (toByte(linear[0]) << 16) | (toByte(linear[1]) << 8) | toByte(linear[2]);
    }

    /** Linear RGB (0–1) of an sRGB colour. */
    public static double[] srgbToLinear(int rgb) {
        return new double[] {toLinear((rgb >> 16) & 0xff), toLinear((rgb >> 8) & 0xff), toLinear(rgb & 0xff)};
    }

    public static double[] labToMsh(double[] lab) {
        double m = Math.sqrt(lab[0] * lab[0] + lab[1] * lab[1] + lab[2] * lab[2]);
        double s = m > 0 ? Math.acos(Math.max(-1, Math.min(1, lab[0] / m))) : 0;
        return new double[] {m, s, Math.atan2(lab[2], lab[1])};
    }

    public static double[] mshToLab(double[] msh) {
        double m = msh[0];
        double s = msh[1];
        double h = msh[2];
        return new double[] {m * Math.cos(s), m * Math.sin(s) * Math.cos(h), m * Math.sin(s) * Math.sin(h)};
    }

    /** The CIE 1976 colour difference ΔE*ab (Euclidean distance in CIELAB) of two sRGB colours. */
    public static double deltaE(int rgb1, int rgb2) {
        double[] a = srgbToLab(rgb1);
        double[] b = srgbToLab(rgb2);
        return Math.sqrt(sq(a[0] - b[0]) + sq(a[1] - b[1]) + sq(a[2] - b[2]));
    }

    private static double sq(double v) {
        return v * v;
    }

    private static double toLinear(int channel) {
        double c = channel / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    private static int toByte(double linear) {
        double c = Math.max(0, Math.min(1, linear));
        double v = c <= 0.0031308 ? 12.92 * c : 1.055 * Math.pow(c, 1 / 2.4) - 0.055;
        return (int) Math.round(v * 255);
    }

    private static double f(double t) {
        return t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16) / 116;
    }

    private static double fInverse(double t) {
        double t3 = t * t * t;
        return t3 > EPSILON ? t3 : (116 * t - 16) / KAPPA;
    }
}
