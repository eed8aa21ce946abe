package dev.sheetwright.nest.model;

/**
 * A failure inside the nesting engine (a bug, or the machine out of memory), never bad input: the command line
 * reports it as an unexpected failure (exit 1) with this message.
 */
public final class NestFailure extends IllegalStateException {
    private static final long serialVersionUID = 1L;

    public NestFailure(String message, Throwable cause) {
        super(message, cause);
    }
}
