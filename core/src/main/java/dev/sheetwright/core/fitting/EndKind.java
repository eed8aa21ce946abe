package dev.sheetwright.core.fitting;

/** Connector or edge allowances on the round ends of a fitting (trade-reference §7.4). */
public enum EndKind {
    NONE("none"),
    LAP("lap"),
    BEAD("bead"),
    CRIMP("crimp"),
    /** A strip turned out at the end, e.g. the flange of a tap that is fastened to the main. */
    FLANGE("flange");

    private final String word;

    EndKind(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }
}
