package org.trendwright.core.regression;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Seeded random regression problems for the property tests: an intercept (usually), up to three
 * powers of a shifted time index t = i + offset (the shift makes them nearly collinear with the
 * intercept and with each other, as raw polynomial trends are), and Gaussian regressors with a
 * mean and a scale of their own, each spanning up to six orders of magnitude. The response is a
 * random combination of the columns plus noise whose size ranges from a thousandth to a thousand
 * times the signal, so small- and large-residual problems both occur. The unit-scaled designs have
 * condition numbers up to about 2e5 (the largest in 1,500 draws): ill-conditioned, but far from
 * the rank tolerance.
 */
final class RandomRegression {

    /** One problem: its design and response. */
    record Problem(Design design, double[] y) {
    }

    private RandomRegression() {
    }

    /** A problem with k regressors and n rows (n > k), drawn from the seed. */
    static Problem generate(long seed, int k, int n) {
        SplittableRandom random = new SplittableRandom(seed);
        boolean intercept = random.nextInt(4) > 0;
        int degree = random.nextInt(Math.min(3, k - (intercept ? 1 : 0)) + 1);
        double offset = random.nextInt(51);
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        if (intercept) {
            columns.add(constant(n, 1.0));
            names.add("intercept");
        }
        for (int power = 1; power <= degree; power++) {
            double[] column = new double[n];
            for (int i = 0; i < n; i++) {
                column[i] = Math.pow(i + offset, power);
            }
            columns.add(column);
            names.add("t^" + power);
        }
        while (columns.size() < k) {
            columns.add(gaussian(random, n));
            names.add("z" + columns.size());
        }
        return new Problem(new Design(columns, names, intercept), response(random, columns));
    }

    /** A column N(mean, scale^2) with mean up to 10 scales and scale 10^U(-3, 3). */
    static double[] gaussian(SplittableRandom random, int n) {
        double scale = Math.pow(10, random.nextDouble(-3, 3));
        double mean = random.nextDouble(-10, 10) * scale;
        double[] column = new double[n];
        for (int i = 0; i < n; i++) {
            column[i] = mean + scale * random.nextGaussian();
        }
        return column;
    }

    private static double[] response(SplittableRandom random, List<double[]> columns) {
        int n = columns.get(0).length;
        double[] signal = new double[n];
        for (double[] column : columns) {
            double weight = random.nextGaussian() * Math.pow(10, random.nextDouble(-2, 2)) / rms(column);
            for (int i = 0; i < n; i++) {
                signal[i] += weight * column[i];
            }
        }
        double noise = Math.pow(10, random.nextDouble(-3, 3)) * rms(signal);
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = signal[i] + noise * random.nextGaussian();
        }
        return y;
    }

    static double rms(double[] v) {
        double sum = 0;
        for (double x : v) {
            sum += x * x;
        }
        return Math.sqrt(sum / v.length);
    }

    static double[] constant(int n, double value) {
        double[] column = new double[n];
        java.util.Arrays.fill(column, value);
        return column;
    }
}
