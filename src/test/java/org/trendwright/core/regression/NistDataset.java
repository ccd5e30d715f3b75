package org.trendwright.core.regression;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.trendwright.testing.ReferenceData;

/**
 * The eleven NIST Statistical Reference Datasets for linear least squares
 * (NIST StRD, https://www.itl.nist.gov/div898/strd/lls/lls.shtml; public domain, credit NIST),
 * each with NIST's difficulty rating and model, and the digits of agreement a fit reaches on the
 * certified values. The data and certified values are copied under
 * src/test/resources/reference/nist-strd (see the README there).
 */
enum NistDataset {
    NORRIS("Norris", "lower", "1"),
    PONTIUS("Pontius", "lower", "2"),
    NOINT1("NoInt1", "average", "0"),
    NOINT2("NoInt2", "average", "0"),
    FILIP("Filip", "higher", "10"),
    LONGLEY("Longley", "higher", "L"),
    WAMPLER1("Wampler1", "lower", "5"),
    WAMPLER2("Wampler2", "lower", "5"),
    WAMPLER3("Wampler3", "lower", "5"),
    WAMPLER4("Wampler4", "higher", "5"),
    WAMPLER5("Wampler5", "higher", "5");

    /** The dataset's name as NIST spells it. */
    final String title;
    /** NIST's difficulty rating: lower, average or higher. */
    final String difficulty;
    /** The polynomial degree in x, "0" for y = b1 x without intercept, "L" for Longley's x1..x6. */
    private final String model;

    NistDataset(String title, String difficulty, String model) {
        this.title = title;
        this.difficulty = difficulty;
        this.model = model;
    }

    /** The dataset with this NIST name. */
    static NistDataset named(String title) {
        return Arrays.stream(values()).filter(d -> d.title.equals(title)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("No NIST StRD dataset " + title));
    }

    /** The response column of the data. */
    double[] response() {
        return ReferenceData.column(dataFile(), 0);
    }

    /**
     * Digits of agreement (log relative error) of {@link LeastSquares#fit} with every certified
     * coefficient ("coef_B1"), its standard error ("coef_B1 se"), the residual SD ("residual_sd")
     * and R^2 ("r_squared"), in the order of the certified file.
     */
    Map<String, Double> digitsReached() {
        return digits(Estimates.of(LeastSquares.fit(design(), response())));
    }

    /**
     * The same digits for the exact least-squares solution of the data as stored in double
     * precision ({@link ExactLeastSquares}): what any double-precision input allows. It falls short
     * of 15 where NIST's decimal data, or the powers of x formed from them, are not doubles.
     */
    Map<String, Double> digitsAttainable() {
        return digits(Estimates.of(ExactLeastSquares.fit(design(), response())));
    }

    /** The certified quantities as some method estimated them. */
    record Estimates(double[] coefficients, double[] standardErrors, double residualSd, double rSquared) {

        static Estimates of(OlsFit fit) {
            return new Estimates(fit.estimates(),
                    fit.coefficients().stream().mapToDouble(Coefficient::standardError).toArray(),
                    fit.standardErrorOfEstimate(), fit.rSquared());
        }

        static Estimates of(ExactLeastSquares.Solution exact) {
            return new Estimates(exact.coefficients(), exact.standardErrors(), exact.residualSd(), exact.rSquared());
        }
    }

    private Map<String, Double> digits(Estimates estimates) {
        Map<String, Double> digits = new LinkedHashMap<>();
        boolean noIntercept = model.equals("0");
        for (String[] row : ReferenceData.rows("nist-strd/" + title + ".certified.csv")) {
            String quantity = row[0];
            double certified = Double.parseDouble(row[1]);
            if (quantity.startsWith("coef_B")) {
                int index = Integer.parseInt(quantity.substring(6)) - (noIntercept ? 1 : 0);
                digits.put(quantity, ReferenceData.logRelativeError(estimates.coefficients()[index], certified));
                double certifiedSe = Double.parseDouble(row[2]);
                digits.put(quantity + " se",
                        ReferenceData.logRelativeError(estimates.standardErrors()[index], certifiedSe));
            } else if (quantity.equals("residual_sd")) {
                digits.put(quantity, ReferenceData.logRelativeError(estimates.residualSd(), certified));
            } else if (quantity.equals("r_squared")) {
                digits.put(quantity, ReferenceData.logRelativeError(estimates.rSquared(), certified));
            }
        }
        return digits;
    }

    /**
     * NIST's model for the dataset: a polynomial of the given degree in x with an intercept, y = b1 x
     * without intercept, or Longley's intercept plus x1..x6. Powers are formed in double precision,
     * as a user's design would be, by StrictMath.pow so that they, and the digits reached, are the
     * same on every platform (Math.pow may differ by an ulp between platforms).
     */
    Design design() {
        if (model.equals("L")) {
            List<double[]> columns = new ArrayList<>();
            List<String> names = new ArrayList<>();
            columns.add(constant(response().length));
            names.add("constant");
            for (int j = 1; j <= 6; j++) {
                columns.add(ReferenceData.column(dataFile(), j));
                names.add("x" + j);
            }
            return new Design(columns, names, true);
        }
        double[] x = ReferenceData.column(dataFile(), 1);
        if (model.equals("0")) {
            return new Design(List.of(x), List.of("x"), false);
        }
        int degree = Integer.parseInt(model);
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int power = 0; power <= degree; power++) {
            double[] column = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                column[i] = StrictMath.pow(x[i], power);
            }
            columns.add(column);
            names.add("x^" + power);
        }
        return new Design(columns, names, true);
    }

    private String dataFile() {
        return "nist-strd/" + title + ".csv";
    }

    private static double[] constant(int n) {
        double[] ones = new double[n];
        Arrays.fill(ones, 1.0);
        return ones;
    }
}
