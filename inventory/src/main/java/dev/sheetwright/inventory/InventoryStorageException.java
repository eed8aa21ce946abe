package dev.sheetwright.inventory;

/** The database file could not be opened, read or written. Nothing was changed by the failed call. */
public class InventoryStorageException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public InventoryStorageException(String message, Throwable cause) {
        super(message, cause);
    }
}
