package dev.sheetwright.nest.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import dev.sheetwright.nest.testing.Shapes;

class NestRankingTest {
    private static final Sheet SHEET = Sheet.unlimited("12x10", 12, 10, 20);
    private static final Remnant FREE_REMNANT = new Remnant("R1", Shapes.rect(0, 0, 12, 10), 0);

    /** Layouts on the given stock, each with one part, the last used to {@code lastLength}. */
    private static NestResult nest(double lastLength, int unplaced, Stock... stock) {
        List<SheetLayout> layouts = new ArrayList<>();
        for (int i = 0; i < stock.length; i++) {
            double used = i == stock.length - 1 ? lastLength : 11.5;
            layouts.add(new SheetLayout(stock[i], i, used, List.of(new Placement("PL", "plate", i, 0.5, 0.5, 0, false)),
                    null, 0.1));
        }
        List<Unplaced> left = new ArrayList<>();
        for (int k = 0; k < unplaced; k++) {
            left.add(new Unplaced("PL", "plate", 10 + k, "too large"));
        }
        return new NestResult(layouts, left);
    }

    private static boolean better(NestResult a, NestResult b) {
        return NestRanking.BEST_FIRST.compare(a, b) < 0 && NestRanking.BEST_FIRST.compare(b, a) > 0;
    }

    @Test
    void everyPiecePlacedComesFirstThenCostThenAreaThenCountThenTheLastSheetsLength() {
        assertTrue(better(nest(4, 0, SHEET, SHEET, SHEET), nest(4, 1, SHEET)), "nothing unplaced beats fewer sheets");
        assertTrue(better(nest(9, 0, SHEET), nest(4, 0, SHEET, SHEET)), "one sheet is cheaper than two");
        assertTrue(better(nest(9, 0, FREE_REMNANT, SHEET), nest(9, 0, SHEET, SHEET)), "a free remnant is cheaper");
        assertTrue(better(nest(3, 0, SHEET, SHEET), nest(7, 0, SHEET, SHEET)), "a shorter last sheet leaves more offcut");
        assertEquals(0, NestRanking.BEST_FIRST.compare(nest(5, 0, SHEET), nest(5, 0, SHEET)));
        assertEquals(40.0, NestRanking.cost(nest(5, 0, SHEET, SHEET)), 1e-12);
    }
}
