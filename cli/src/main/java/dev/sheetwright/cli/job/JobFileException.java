package dev.sheetwright.cli.job;

/** Bad job file: names the file, the fitting (when the error is in one) and the field. */
public class JobFileException extends IllegalArgumentException {

    public JobFileException(String file, String fitting, String field, String message) {
        super(file + ": " + (fitting == null ? "" : "fitting '" + fitting + "', ")
                + (field == null ? "" : "field '" + field + "': ") + message);
    }
}
