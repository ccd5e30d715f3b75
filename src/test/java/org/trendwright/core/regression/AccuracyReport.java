package org.trendwright.core.regression;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Predicate;

/**
 * Prints, as a Markdown table, the fewest digits of agreement (log relative error, LRE) with NIST's
 * certified values that {@link LeastSquares#fit} reaches on each of the eleven NIST StRD linear
 * datasets, for the coefficients, their standard errors, the residual SD and R^2; in brackets the
 * digits the exact least-squares solution of the same double-precision data reaches
 * ({@link ExactLeastSquares}). The table in src/docs/accuracy.md is this program's output;
 * regenerate it with
 * <pre>
 * mvn -B -o -q test-compile org.codehaus.mojo:exec-maven-plugin:3.5.1:java \
 *     -Dexec.classpathScope=test -Dexec.mainClass=org.trendwright.core.regression.AccuracyReport
 * </pre>
 */
public final class AccuracyReport {

    private AccuracyReport() {
    }

    public static void main(String[] args) {
        System.out.println("| Dataset | NIST difficulty | Coefficients | Standard errors | Residual SD | R² |");
        System.out.println("|---|---|---:|---:|---:|---:|");
        for (NistDataset dataset : NistDataset.values()) {
            Map<String, Double> reached = dataset.digitsReached();
            Map<String, Double> attainable = dataset.digitsAttainable();
            StringBuilder line = new StringBuilder("| " + dataset.title + " | " + dataset.difficulty + " |");
            for (Predicate<String> quantities : QUANTITIES) {
                line.append(' ').append(fewest(reached, quantities))
                        .append(" (").append(fewest(attainable, quantities)).append(") |");
            }
            System.out.println(line);
        }
    }

    /** Coefficients, standard errors, residual SD, R^2: the table's columns, by certified name. */
    private static final List<Predicate<String>> QUANTITIES = List.of(
            q -> q.startsWith("coef_B") && !q.endsWith(" se"),
            q -> q.endsWith(" se"),
            q -> q.equals("residual_sd"),
            q -> q.equals("r_squared"));

    private static String fewest(Map<String, Double> digits, Predicate<String> quantities) {
        double fewest = digits.entrySet().stream().filter(e -> quantities.test(e.getKey()))
                .mapToDouble(Map.Entry::getValue).min().orElseThrow();
        return String.format(Locale.ROOT, "%.1f", fewest);
    }
}
