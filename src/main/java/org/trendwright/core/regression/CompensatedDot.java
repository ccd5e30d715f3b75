package org.trendwright.core.regression;

/**
 * A sum of terms and products accumulated in double-double arithmetic: algorithm Dot2 of Ogita,
 * Rump & Oishi (2005), "Accurate sum and dot product", SIAM J. Sci. Comput. 26(6), 1955-1988.
 *
 * <p>Every product a b is split without error into p + e with p = fl(a b) and
 * e = fma(a, b, -p) (the error-free product of Dekker 1971, "A floating-point technique for
 * extending the available precision", Numer. Math. 18, 224-242, which a fused multiply-add gives
 * in one operation), and every partial sum into s + q by Knuth's branch-free TwoSum (The Art of
 * Computer Programming, vol. 2, 1969). The errors e and q are summed on the side and added at the
 * end. The result is as accurate as if it had been computed in twice the working precision and
 * then rounded: |result - exact| <= u |exact| + gamma_n^2 sum |terms|, with u = 2^-53 and
 * gamma_n = n u / (1 - n u), the error bound of Dot2 in Section 5 of the paper. That is what makes
 * residuals such as y - r - X b, whose terms cancel to many digits, come out right.
 *
 * <p>Not thread-safe: one instance per sum.
 */
final class CompensatedDot {

    private double sum;
    private double error;

    /** Adds the term a. */
    CompensatedDot add(double a) {
        double next = sum + a;
        double rounding = twoSumError(sum, a, next);
        sum = next;
        error += rounding;
        return this;
    }

    /** Adds the product a b. */
    CompensatedDot addProduct(double a, double b) {
        double product = a * b;
        double productError = Math.fma(a, b, -product);
        double next = sum + product;
        double rounding = twoSumError(sum, product, next);
        sum = next;
        error += rounding + productError;
        return this;
    }

    /** The accumulated value, rounded to double. */
    double value() {
        return sum + error;
    }

    /**
     * What {@link #value()} leaves out: value() + lowPart() equals the unrounded sum + error, so
     * the pair carries the result to about twice the working precision.
     */
    double lowPart() {
        double value = sum + error;
        return error - (value - sum);
    }

    /** The rounding error of s = fl(a + b), exactly: a + b = s + error (Knuth's TwoSum). */
    private static double twoSumError(double a, double b, double s) {
        double bVirtual = s - a;
        double aVirtual = s - bVirtual;
        return (a - aVirtual) + (b - bVirtual);
    }
}
