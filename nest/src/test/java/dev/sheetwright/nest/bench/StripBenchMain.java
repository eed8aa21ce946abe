package dev.sheetwright.nest.bench;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Locale;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.check.Violation;
import dev.sheetwright.nest.model.NestOptions;

/** Test-scope runner: java -cp ... StripBenchMain SECONDS|iN FILE... ; prints one line per instance, checked. */
public final class StripBenchMain {
    private StripBenchMain() {
    }

    public static void main(String[] args) {
        String spec = args[0];
        for (int i = 1; i < args.length; i++) {
            StripInstance inst = StripInstance.read(Path.of(args[i]));
            NestOptions opt = spec.startsWith("i") ? NestOptions.steps(Long.parseLong(spec.substring(1)), 1, 2)
                    : NestOptions.timed(Duration.ofMillis((long) (Double.parseDouble(spec) * 1000)), 1, 2);
            StripPacker.StripResult r = StripPacker.pack(inst, opt);
            List<Violation> v = NestChecker.check(inst.toRequest(), r.nest());
            System.out.printf(Locale.ROOT, "%-9s pieces %3d length %10.3f density %.4f seconds %.2f violations %d %s%n",
                    inst.name(), inst.pieceCount(), r.length(), r.density(), r.seconds(), v.size(), v.isEmpty() ? "" : v.get(0));
        }
    }
}
