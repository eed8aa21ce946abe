package dev.sheetwright.cli.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The progress line's text (the terminal redraw itself needs a terminal). */
class ProgressTest {

    @Test
    void line_sheets_elapsedRemainingSheetsUtilization() {
        assertEquals("[#####...............] 15.0 s elapsed, 45.0 s left  best: 11 sheets, utilization 71.3 %",
                Progress.line(15, 60, true, 11, 80.5, 0.7126, false));
    }

    @Test
    void line_coil_showsStripLength() {
        assertEquals("[####################] 10.0 s elapsed, 0.0 s left  best: strip 6774.8 long, utilization 65.3 %",
                Progress.line(10, 10, true, 1, 6774.79, 0.6529, true));
    }

    @Test
    void line_beforeFirstLayout_searching() {
        assertEquals("[....................] 0.0 s elapsed, 2.0 s left  best: searching",
                Progress.line(0, 2, false, 0, 0, 0, false));
    }

    @Test
    void line_oneSheetOverTime_singularAndNoNegativeRemainder() {
        assertEquals("[####################] 3.2 s elapsed, 0.0 s left  best: 1 sheet, utilization 50.0 %",
                Progress.line(3.2, 3, true, 1, 10, 0.5, false));
    }
}
