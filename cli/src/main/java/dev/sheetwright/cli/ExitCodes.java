package dev.sheetwright.cli;

import dev.sheetwright.inventory.RemnantConflictException;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;

/** The exit codes, and the one place where engine exceptions become them. */
public final class ExitCodes {
    /** Done. */
    public static final int OK = 0;
    /** Unexpected failure (database or file trouble, a bug). */
    public static final int FAILURE = 1;
    /** Bad input: the message names the field and value; nothing was changed. */
    public static final int BAD_INPUT = 2;

    /** For {@code exitCodeList} in command annotations. */
    static final String LIST_OK = "0:done";
    static final String LIST_FAILURE = "1:unexpected failure";
    static final String LIST_BAD_INPUT = "2:bad input (nothing changed)";

    private ExitCodes() {
    }

    /**
     * Runs a command body: {@link IllegalArgumentException} and {@link RemnantConflictException} print
     * their message and give {@link #BAD_INPUT}; any other exception prints its message and gives
     * {@link #FAILURE}. Messages go to the command's error writer, without a stack trace.
     */
    public static int run(CommandSpec spec, Callable<Integer> body) {
        PrintWriter err = spec.commandLine().getErr();
        try {
            return body.call();
        } catch (IllegalArgumentException | RemnantConflictException e) {
            err.println(e.getMessage());
            return BAD_INPUT;
        } catch (Exception e) {
            err.println("error: " + e.getMessage());
            return FAILURE;
        } finally {
            err.flush();
            spec.commandLine().getOut().flush();
        }
    }
}
