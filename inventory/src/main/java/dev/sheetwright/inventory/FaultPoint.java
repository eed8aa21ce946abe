package dev.sheetwright.inventory;

/** A place where tests can make a transaction fail halfway. Package-private. */
interface FaultPoint {
    FaultPoint NONE = step -> { };

    void reached(String step);
}
