package dev.sheetwright.cli;

import picocli.CommandLine;

/** Entry point: runs the command tree and exits with its code. Only this class calls {@code System.exit}. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        System.exit(SheetwrightCommand.commandLine().execute(args));
    }
}
