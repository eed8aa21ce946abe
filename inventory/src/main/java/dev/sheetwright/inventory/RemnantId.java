package dev.sheetwright.inventory;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Label ids such as {@code R-0042}: the letter R, a dash and a sequence number of at least four digits.
 * Package-private; ids reach callers as plain strings.
 */
final class RemnantId {
    private static final Pattern FORM = Pattern.compile("[Rr]-(\\d{1,9})");

    private RemnantId() {
    }

    static String format(long number) {
        return String.format(java.util.Locale.ROOT, "R-%04d", number);
    }

    /**
     * Parses an id into its sequence number.
     *
     * @throws IllegalArgumentException naming the value and the expected form
     */
    static long parse(String id) {
        Matcher m = id == null ? null : FORM.matcher(id.strip());
        if (m == null || !m.matches() || Long.parseLong(m.group(1)) == 0) {
            throw new IllegalArgumentException(
                    "id: '" + id + "' is not a remnant id; expected R- followed by a number from 1, e.g. R-0042");
        }
        return Long.parseLong(m.group(1));
    }
}
