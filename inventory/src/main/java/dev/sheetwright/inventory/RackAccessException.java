package dev.sheetwright.inventory;

/**
 * The rack cannot be reached or is not a rack: no file there, another program's database, a server that refuses
 * the connection, a failed login or an unknown database. The message names the location (never a password) and
 * what failed; nothing was changed. The command line treats it as bad input.
 */
public final class RackAccessException extends RuntimeException {
    public RackAccessException(String message, Throwable cause) {
        super(message, cause);
    }
}
