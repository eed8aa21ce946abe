package dev.sheetwright.cli;

import dev.sheetwright.inventory.RackAccessException;
import dev.sheetwright.inventory.RemnantConflictException;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine;

/** The exit codes, and the one place where exceptions become them. */
public final class ExitCodes {

    /** Done. */
    public static final int OK = 0;
    /** Unexpected failure: a bug, database or file trouble; the message says which. */
    public static final int FAILURE = 1;
    /** Bad input: the message names the file, fitting and field (or the value); nothing was written or changed. */
    public static final int BAD_INPUT = 2;
    /** Nesting finished but some pieces could not be placed; they are listed with the reason. */
    public static final int UNPLACED = 3;

    /** For {@code exitCodeList} in command annotations. */
    public static final String LIST_OK = "0:done";
    public static final String LIST_FAILURE = "1:unexpected failure";
    public static final String LIST_BAD_INPUT = "2:bad input (nothing changed)";

    private ExitCodes() {
    }

    /**
     * The exit code for an exception: bad input (including a remnant taken by another plan, and a rack that is not
     * there, not a rack, or whose server refuses the connection or login) or failure.
     */
    public static int of(Throwable t) {
        if (t instanceof IllegalArgumentException || t instanceof RemnantConflictException
                || t instanceof RackAccessException || t instanceof CommandLine.ParameterException) {
            return BAD_INPUT;
        }
        return FAILURE;
    }

    /** Prints the message of {@code e} the way every command does and returns its exit code. */
    public static int report(Throwable e, PrintWriter err) {
        int code = of(e);
        err.println((code == BAD_INPUT ? "error: " : "failed: ")
                + (e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage()));
        if (code == FAILURE && Boolean.getBoolean("sheetwright.verbose")) {
            e.printStackTrace(err);
        }
        err.flush();
        return code;
    }

    /**
     * Runs a command body so that it maps its own exceptions even when used outside the root command line (the
     * remnant commands' tests run them alone).
     */
    public static int run(CommandSpec spec, Callable<Integer> body) {
        try {
            return body.call();
        } catch (Exception e) {
            return report(e, spec.commandLine().getErr());
        } finally {
            spec.commandLine().getOut().flush();
        }
    }
}
