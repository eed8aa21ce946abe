package dev.sheetwright.nest.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.check.Violation;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.testing.External;

/**
 * Published layouts (Gomes & Oliveira 2006, SAHA, as stored in the ESICUP data and rechecked in the benchmark
 * README, section A) must pass our checker; nudging one piece into its neighbour must fail it.
 */
class PublishedLayoutTest {
    @ParameterizedTest
    @CsvSource({
        // instance, algorithm, density from the benchmark README section A (SAHA, Gomes & Oliveira 2006)
        "shapes0, SAHA, 0.6650",
        "fu, SAHA, 0.9096",
        "trousers, SAHA, 0.8996",
    })
    void publishedLayout_isValid_andNudgeIsCaught(String name, String algorithm, double density) {
        StripInstance inst = StripInstance.read(External.benchmark(name + ".json"));
        PublishedLayouts.Layout layout = PublishedLayouts.read(External.benchmark("published-layouts.json")).stream()
                .filter(l -> l.instance().equals(name) && l.algorithm().equals(algorithm)).findFirst().orElseThrow();
        NestResult result = layout.toResult(inst);

        List<Violation> ok = NestChecker.check(inst.toRequest(), result);
        assertEquals(List.of(), ok);
        assertEquals(density, inst.itemArea() / (inst.stripHeight() * layout.declaredStripLength()), 5e-5);

        // nudge the first piece that has a neighbour to its right by 30 % of its width towards it
        SheetLayout sheet = result.sheets().get(0);
        boolean caught = false;
        for (int i = 0; i < sheet.parts().size() && !caught; i++) {
            List<Placement> parts = new ArrayList<>(sheet.parts());
            Placement p = parts.get(i);
            StripInstance.Item item = inst.items().stream().filter(it -> StripInstance.pieceName(it.id()).equals(p.piece())).findFirst().orElseThrow();
            double w = p.apply(item.polygon()).getEnvelopeInternal().getWidth();
            for (double dir : new double[] {1, -1}) {
                parts.set(i, new Placement(p.fitting(), p.piece(), p.copy(), p.x() + dir * 0.3 * w, p.y(), p.rotationDeg(), false));
                NestResult nudged = new NestResult(List.of(new SheetLayout(sheet.stock(), 0, sheet.usedLength() + w, parts, null, 0)), List.of());
                List<Violation> v = NestChecker.check(inst.toRequest(), nudged);
                if (v.stream().anyMatch(x -> x.kind() == Violation.Kind.OVERLAP)) {
                    caught = true;
                    assertTrue(v.get(0).message().contains("overlaps"), v.toString());
                    break;
                }
            }
        }
        assertTrue(caught, "no nudge produced an overlap");
        assertFalse(sheet.parts().isEmpty());
    }
}
