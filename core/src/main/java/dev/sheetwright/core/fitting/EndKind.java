package dev.sheetwright.core.fitting;

/**
 * Connector or edge allowances on the ends of a fitting: round ends (trade-reference §7.4) and the transverse
 * connectors of rectangular duct ({@link #SLIP}, {@link #DRIVE}, §7.3).
 */
public enum EndKind {
    NONE("none"),
    LAP("lap"),
    BEAD("bead"),
    CRIMP("crimp"),
    /** A strip turned out at the end, e.g. the flange of a tap that is fastened to the main. */
    FLANGE("flange"),
    /** Rectangular duct edge that enters a flat S slip: left raw beyond the net line so the S can grip (§7.3). */
    SLIP("slip"),
    /** Rectangular duct edge that receives a drive cleat: turned back in a 180 degree hem (§7.3). */
    DRIVE("drive"),
    /** Tabs turned out along a rectangular tap's main edge for fastening to the main (§13.7). */
    TABS("tabs");

    private final String word;

    EndKind(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** True for the connectors that belong to rectangular duct only. */
    public boolean rectangularOnly() {
        return this == SLIP || this == DRIVE || this == TABS;
    }
}
