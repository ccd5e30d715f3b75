package org.trendwright.series;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.series.IntakeException.Reason;

/**
 * Detects the delimiter of a CSV file among comma, semicolon and tab. Over the first
 * {@value #SAMPLE_LINES} non-blank lines, counting only characters outside double quotes, a
 * candidate is consistent when it occurs equally often, and at least once, on every line. The
 * consistent candidate with the most occurrences wins; a tie is refused as ambiguous (for example
 * {@code 2024-Q1;1,5}, a decimal comma in a semicolon file) rather than guessed. When no candidate
 * is consistent, the one most frequent on the first line wins if it is unique. Stateless and
 * thread-safe.
 */
public final class Delimiters {

    static final int SAMPLE_LINES = 20;
    private static final char[] CANDIDATES = {',', ';', '\t'};

    private Delimiters() {
    }

    static char detect(String text) {
        List<String> lines = sample(text);
        if (lines.isEmpty()) {
            return ',';
        }
        int[][] counts = new int[CANDIDATES.length][lines.size()];
        for (int c = 0; c < CANDIDATES.length; c++) {
            for (int i = 0; i < lines.size(); i++) {
                counts[c][i] = countOutsideQuotes(lines.get(i), CANDIDATES[c]);
            }
        }
        Character best = best(counts, true);
        return best != null ? best : best(counts, false) != null ? best(counts, false) : ',';
    }

    private static Character best(int[][] counts, boolean consistentOnly) {
        int bestCount = 0;
        List<Character> winners = new ArrayList<>();
        for (int c = 0; c < CANDIDATES.length; c++) {
            if (consistentOnly && !consistent(counts[c])) {
                continue;
            }
            int count = counts[c][0];
            if (count > bestCount) {
                bestCount = count;
                winners.clear();
            }
            if (count == bestCount && count > 0) {
                winners.add(CANDIDATES[c]);
            }
        }
        if (winners.size() > 1) {
            throw new IntakeException(Reason.AMBIGUOUS, Where.line(1), "the delimiter could be '"
                    + name(winners.get(0)) + "' or '" + name(winners.get(1)) + "'; numbers need a decimal point (no"
                    + " decimal commas), or name the delimiter with delimiter=comma, semicolon or tab.");
        }
        return winners.isEmpty() ? null : winners.get(0);
    }

    private static boolean consistent(int[] counts) {
        for (int count : counts) {
            if (count == 0 || count != counts[0]) {
                return false;
            }
        }
        return true;
    }

    private static List<String> sample(String text) {
        List<String> lines = new ArrayList<>();
        for (String line : text.split("\r?\n", SAMPLE_LINES * 4)) {
            if (!line.isBlank() && lines.size() < SAMPLE_LINES) {
                lines.add(line);
            }
        }
        return lines;
    }

    private static int countOutsideQuotes(String line, char delimiter) {
        int count = 0;
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char ch = line.charAt(i);
            if (ch == '"') {
                quoted = !quoted;
            } else if (ch == delimiter && !quoted) {
                count++;
            }
        }
        return count;
    }

    /** "comma", "semicolon" or "tab" for a delimiter, the character itself otherwise. */
    public static String name(char delimiter) {
        return switch (delimiter) {
            case ',' -> "comma";
            case ';' -> "semicolon";
            case '\t' -> "tab";
            default -> String.valueOf(delimiter);
        };
    }

    /** The delimiter a request names: comma, semicolon, tab, or the character itself. */
    public static Character fromName(String name) {
        return switch (name.trim().toLowerCase(java.util.Locale.ROOT)) {
            case "comma", "," -> ',';
            case "semicolon", ";" -> ';';
            case "tab", "\t", "\\t" -> '\t';
            default -> null;
        };
    }
}
