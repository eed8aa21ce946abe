package dev.sheetwright.cli;

/** Exit codes of every command (also listed in {@code --help}). */
public final class ExitCodes {

    /** Done. */
    public static final int OK = 0;
    /** Unexpected failure: a bug or an I/O problem; the message says which. */
    public static final int FAILURE = 1;
    /** Bad input: the message names the file, fitting and field; nothing was written. */
    public static final int BAD_INPUT = 2;
    /** Nesting finished but some pieces could not be placed; they are listed with the reason. */
    public static final int UNPLACED = 3;

    private ExitCodes() {
    }
}
