package org.meridian.maps;

/**
 * Simulated dichromatic colour vision for tests of colour choices: Machado, Oliveira &amp;
 * Fernandes (2009), "A physiologically-based model for simulation of color vision deficiency",
 * matrices for severity 1.0, applied to linear RGB (from memory).
 */
public enum Dichromacy {
    PROTANOPIA(new double[][] {{0.152286, 1.052583, -0.204868}, {0.114503, 0.786281, 0.099216},
        {-0.003882, -0.048116, 1.051998}}),
    DEUTERANOPIA(new double[][] {{0.367322, 0.860646, -0.227968}, {0.280085, 0.672501, 0.047413},
        {-0.011820, 0.042940, 0.968881}}),
    TRITANOPIA(new double[][] {{1.255528, -0.076749, -0.178779}, {-0.078411, 0.930809, 0.147602},
        {0.004733, 0.691367, 0.303900}});

    private final double[][] m;

    Dichromacy(double[][] m) {
        this.m = m;
    }

    /** How an sRGB colour looks to a dichromat, as sRGB. */
    public int simulate(int rgb) {
        double[] l = ColourSpace.srgbToLinear(rgb);
        double[] out = new double[3];
        for (int i = 0; i < 3; i++) {
            out[i] = m[i][0] * l[0] + m[i][1] * l[1] + m[i][2] * l[2];
        }
        return ColourSpace.linearToSrgb(out);
    }
}
