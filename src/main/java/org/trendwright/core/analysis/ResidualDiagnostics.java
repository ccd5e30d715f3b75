package org.trendwright.core.analysis;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.TestResult;
import org.trendwright.core.diagnostics.ArchTestResult;
import org.trendwright.core.diagnostics.BreuschGodfreyResult;
import org.trendwright.core.diagnostics.Correlogram;
import org.trendwright.core.diagnostics.DurbinWatsonResult;
import org.trendwright.core.diagnostics.LjungBoxResult;

/**
 * The residual checks of a least-squares trend fit, all on its residuals in time order.
 *
 * @param durbinWatson    the exact Durbin-Watson test with its bounds
 * @param breuschGodfrey  the Breusch-Godfrey LM test (chi-square and F forms)
 * @param ljungBox        the Ljung-Box test
 * @param arch            Engle's ARCH LM test of order 1
 * @param correlogram     residual autocorrelations with their +-2/sqrt(n) band
 */
public record ResidualDiagnostics(DurbinWatsonResult durbinWatson, BreuschGodfreyResult breuschGodfrey,
                                  LjungBoxResult ljungBox, ArchTestResult arch, Correlogram correlogram) {

    /** The tests in the common shape, in the order they are usually read. */
    public List<TestResult> tests() {
        List<TestResult> tests = new ArrayList<>();
        tests.add(durbinWatson.toTestResult());
        tests.add(breuschGodfrey.lagrangeMultiplier());
        tests.add(breuschGodfrey.fForm());
        tests.add(ljungBox.test());
        tests.add(arch.test());
        return tests;
    }
}
