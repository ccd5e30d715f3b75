package org.trendwright.core.breaks;

/**
 * A reproducible stream of independent standard normal draws, written out so that one seed gives
 * the same draws on every Java version and platform (java.util.SplittableRandom promises equal
 * sequences only within one program execution, and its Gaussian algorithm is an implementation
 * choice).
 *
 * <p>Uniform bits come from SplitMix64 (Steele, Lea &amp; Flood 2014, "Fast splittable
 * pseudorandom number generators", OOPSLA): a Weyl sequence with the odd increment
 * 0x9E3779B97F4A7C15 passed through a 64-bit mixing function (the constants are Stafford's
 * "Mix13", as in Vigna's public-domain reference implementation; from memory). Pairs of uniforms
 * on (-1, 1) become pairs of normals by the polar method (Marsaglia &amp; Bray 1964, "A convenient
 * method for generating normal variables", SIAM Review 6): accept (u, v) inside the unit disc,
 * s = u^2 + v^2, and return u f and v f with f = sqrt(-2 ln(s) / s). {@code StrictMath.log} keeps
 * the result bit-identical across platforms.
 *
 * <p>Not thread-safe: each simulation owns its stream.
 */
final class NormalStream {

    private static final long WEYL_INCREMENT = 0x9E3779B97F4A7C15L;

    private long state;

    NormalStream(long seed) {
        state = seed;
    }

    /** The SplitMix64 output function: a bijection of the 64-bit integers that mixes every bit. */
    static long mix(long value) {
        long z = (value ^ (value >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /**
     * Fills {@code out} with independent N(0, 1) draws; when its length is odd, the second draw of
     * the last pair is discarded.
     */
    void fill(double[] out) {
        for (int i = 0; i < out.length; i += 2) {
            double u;
            double v;
            double s;
            do {
                u = nextSymmetric();
                v = nextSymmetric();
                s = u * u + v * v;
            } while (s >= 1 || s == 0);
            double factor = Math.sqrt(-2 * StrictMath.log(s) / s);
            out[i] = u * factor;
            if (i + 1 < out.length) {
                out[i + 1] = v * factor;
            }
        }
    }

    /** The next SplitMix64 output: the mixed next term of the Weyl sequence. */
    long nextLong() {
        state += WEYL_INCREMENT;
        return mix(state);
    }

    /** A uniform on [-1, 1): the top 53 bits of the next output, scaled to [0, 2), minus 1. */
    private double nextSymmetric() {
        return (nextLong() >>> 11) * 0x1.0p-52 - 1;
    }
}
