package dev.sheetwright.core.fitting;

/** Longitudinal seam styles (trade-reference §7.1, §7.2). */
public enum SeamKind {
    NONE("none"),
    LAP("lap"),
    GROOVE("groove"),
    PITTSBURGH("pittsburgh"),
    SNAP_LOCK("snap-lock"),
    BUTT("butt");

    private final String word;

    SeamKind(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }
}
