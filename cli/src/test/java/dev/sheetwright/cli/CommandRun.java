package dev.sheetwright.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import picocli.CommandLine;

/** Runs the command tree in-process with captured output, as a test would from a terminal. */
record CommandRun(int exitCode, String out, String err) {

    static CommandRun of(String... args) {
        CommandLine cl = SheetwrightCommand.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new CommandRun(code, out.toString(), err.toString());
    }

    @Override
    public String toString() {
        return "exit " + exitCode + "\n--- out\n" + out + "--- err\n" + err;
    }
}
