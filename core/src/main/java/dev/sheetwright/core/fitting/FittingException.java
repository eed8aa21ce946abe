package dev.sheetwright.core.fitting;

/** Bad input for one fitting: names the fitting id and the field, so the shop can find the ticket line. */
public class FittingException extends IllegalArgumentException {

    private final String fitting;
    private final String field;

    public FittingException(String fitting, String field, String message) {
        super("fitting '" + fitting + "', field '" + field + "': " + message);
        this.fitting = fitting;
        this.field = field;
    }

    public String fitting() {
        return fitting;
    }

    public String field() {
        return field;
    }
}
