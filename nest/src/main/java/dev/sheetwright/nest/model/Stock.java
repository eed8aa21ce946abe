package dev.sheetwright.nest.model;

import java.util.function.Function;

/** Material the parts are cut from: a sheet size, a remnant of any shape, or a coil. */
public sealed interface Stock permits Sheet, Remnant, Coil {
    /** Name or id, used in messages and reports. */
    String label();

    /**
     * The one case analysis over the kinds of stock (Java 17 has no pattern switch): each kind calls its own
     * function, and a new kind must say what it does in every caller.
     */
    <T> T match(Function<? super Sheet, ? extends T> sheet, Function<? super Remnant, ? extends T> remnant,
            Function<? super Coil, ? extends T> coil);
}
