package dev.sheetwright.cli.mixin;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.nest.model.NestOptions;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

class SheetSearchOptionTest {
    @Command(name = "t")
    static final class Holder {
        @Mixin
        SheetSearchOption sheetSearch;
    }

    private static SheetSearchOption parse(String... args) {
        Holder h = new Holder();
        new CommandLine(h).parseArgs(args);
        return h.sheetSearch;
    }

    private static final NestOptions SHORT = NestOptions.timed(Duration.ofSeconds(10), 1, 2);
    private static final NestOptions LONG = NestOptions.timed(Duration.ofSeconds(60), 1, 2);
    private static final NestOptions COUNTED = NestOptions.steps(5000, 1, 2);

    @Test
    void unsaidItFollowsTheTimeLimit() {
        SheetSearchOption o = parse();
        assertFalse(o.on(SHORT));
        assertTrue(o.on(LONG));
        assertFalse(o.on(COUNTED));
    }

    @Test
    void saidItIsWhatWasSaid() {
        assertTrue(parse("--sheet-search").on(SHORT));
        assertTrue(parse("--sheet-search").on(COUNTED));
        assertFalse(parse("--no-sheet-search").on(LONG));
    }
}
