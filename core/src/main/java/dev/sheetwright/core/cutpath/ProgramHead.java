package dev.sheetwright.core.cutpath;

import java.util.List;

/**
 * What a program says about itself in its comment head: the job, which sheet of how many, the stock, the metal,
 * the process, and the safety cautions.
 */
public record ProgramHead(String job, int sheet, int sheets, String stock, String material, String process,
        List<String> cautions) {

    public ProgramHead {
        if (job == null || stock == null || material == null || process == null) {
            throw new IllegalArgumentException("program head texts must not be null");
        }
        if (sheet < 1 || sheet > sheets) {
            throw new IllegalArgumentException("sheet must be from 1 to " + sheets + ", got " + sheet);
        }
        cautions = List.copyOf(cautions);
    }
}
