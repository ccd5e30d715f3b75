/**
 * Unit-root testing: the augmented Dickey-Fuller test
 * ({@link org.trendwright.core.unitroot.AugmentedDickeyFuller}) with p-values and critical values
 * from the project's own seeded simulation of the tau distribution
 * ({@link org.trendwright.core.unitroot.DickeyFullerDistribution}). Imports only java.* and
 * Commons Math; the tables are read from the class path.
 */
package org.trendwright.core.unitroot;
