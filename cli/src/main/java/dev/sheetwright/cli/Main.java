package dev.sheetwright.cli;

/** Entry point; the command tree is set up in {@link SheetwrightCommand}. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(0);
    }
}
