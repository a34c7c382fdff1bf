package org.meridian.sim;

/**
 * A seeded stream of random numbers whose every value is fixed by the seed on any machine and
 * any Java version: the SplitMix64 generator of Steele, Lea &amp; Flood (2014, "Fast splittable
 * pseudorandom number generators", OOPSLA), uniform doubles from its top 53 bits, and standard
 * normal values by the polar method of Marsaglia &amp; Bray (1964) with {@link StrictMath}, so no
 * platform-specific last bit can creep in. (The generator equals the one inside
 * {@code java.util.SplittableRandom}, whose algorithm the JDK does not promise to keep.)
 *
 * <p>{@link #derive} gives independent streams keyed by integers (participant, source,
 * condition …), so a participant's draws do not depend on how many participants or sources come
 * before it. Not thread-safe; one stream per task.
 */
public final class SeededStream {
    private static final long GOLDEN_GAMMA = 0x9e3779b97f4a7c15L;
    private static final double DOUBLE_UNIT = 0x1.0p-53;

    private long state;
    private double spareGaussian;
    private boolean hasSpare;

    public SeededStream(long seed) {
        this.state = seed;
    }

    /** A stream for the given keys, independent of the streams for other keys. */
    public static SeededStream derive(long seed, long... keys) {
        long s = mix64(seed + GOLDEN_GAMMA);
        for (long k : keys) {
            s = mix64(s + GOLDEN_GAMMA * (2 * k + 1));
        }
        return new SeededStream(s);
    }

    public long nextLong() {
        state += GOLDEN_GAMMA;
        return mix64(state);
    }

    /** Uniform in [0, 1). */
    public double nextDouble() {
        return (nextLong() >>> 11) * DOUBLE_UNIT;
    }

    /** Uniform integer in [0, bound), by rejection so every value is equally likely. */
    public int nextInt(int bound) {
        if (bound <= 0) {
            throw new IllegalArgumentException("bound must be positive, got " + bound);
        }
        long limit = Long.MAX_VALUE - Long.MAX_VALUE % bound;
        while (true) {
            long r = nextLong() >>> 1;
            if (r < limit) {
                return (int) (r % bound);
            }
        }
    }

    /** Standard normal (Marsaglia &amp; Bray's polar method; the second value is kept). */
    public double nextGaussian() {
        if (hasSpare) {
            hasSpare = false;
            return spareGaussian;
        }
        double u;
        double v;
        double s;
        do {
            u = 2 * nextDouble() - 1;
            v = 2 * nextDouble() - 1;
            s = u * u + v * v;
        } while (s >= 1 || s == 0);
        double m = StrictMath.sqrt(-2 * StrictMath.log(s) / s);
        spareGaussian = v * m;
        hasSpare = true;
        return u * m;
    }

    /** SplitMix64's finaliser (Stafford's variant 13 of the MurmurHash3 mixer). */
    static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
