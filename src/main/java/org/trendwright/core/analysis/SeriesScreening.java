package org.trendwright.core.analysis;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.trendwright.core.breaks.BreakSearch;
import org.trendwright.core.unitroot.AdfResult;

/**
 * Checks of the series itself, made before trusting any trend model on it: is there a unit root
 * (a trend regression on such a series can be spurious), and did the trend break somewhere?
 *
 * @param unitRoot   the augmented Dickey-Fuller test with constant and trend; empty when it could
 *                   not be run (see notes)
 * @param trendBreak the sup-F search for one break in a linear trend; empty when it could not be
 *                   run (see notes)
 * @param breakTime  the period index t where the new regime of the most likely break starts
 * @param notes      plain sentences on what was skipped and why
 */
public record SeriesScreening(Optional<AdfResult> unitRoot, Optional<BreakSearch> trendBreak, OptionalInt breakTime,
                              List<String> notes) {

    public SeriesScreening {
        notes = List.copyOf(notes);
    }
}
