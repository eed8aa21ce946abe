package dev.sheetwright.nest.model;

/** Material the parts are cut from: a sheet size, a remnant of any shape, or a coil. */
public sealed interface Stock permits Sheet, Remnant, Coil {
    /** Name or id, used in messages and reports. */
    String label();
}
