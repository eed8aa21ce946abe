package dev.sheetwright.cli.job;

import dev.sheetwright.core.cutpath.MachineSettings;
import dev.sheetwright.core.units.LengthUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * The shop file's {@code machine:} section: the table's G-code dialect. Torch codes must be M-codes; heights are
 * in the shop file's units and come all three or not at all (a machine without a Z axis has none).
 */
final class MachineReader {

    static final Set<String> KEYS = Set.of("torch-on", "torch-off", "pierce-delay", "header", "footer",
            "line-numbers", "safe-height", "pierce-height", "cut-height");
    private static final List<String> HEIGHTS = List.of("safe-height", "pierce-height", "cut-height");

    private MachineReader() {
    }

    static MachineSettings read(Fields m, LengthUnit unit) {
        m.allowOnly(KEYS);
        MachineSettings d = MachineSettings.DEFAULT;
        String on = code(m, "torch-on", d.torchOn());
        String off = code(m, "torch-off", d.torchOff());
        if (MachineSettings.sameCode(on, off)) {
            throw m.error("torch-off", "must differ from torch-on (" + on + ")");
        }
        OptionalDouble delay = OptionalDouble.empty();
        if (m.has("pierce-delay")) {
            double v = m.notNegative("pierce-delay", 0);
            if (v > 60) {
                throw m.error("pierce-delay", "must be from 0 to 60 seconds, got " + v);
            }
            delay = OptionalDouble.of(v);
        }
        List<String> header = lines(m, "header", d.header());
        List<String> footer = lines(m, "footer", d.footer());
        boolean numbers = m.bool("line-numbers", d.lineNumbers());
        long given = HEIGHTS.stream().filter(m::has).count();
        Optional<MachineSettings.Heights> heights = Optional.empty();
        if (given > 0 && given < HEIGHTS.size()) {
            String missing = HEIGHTS.stream().filter(k -> !m.has(k)).findFirst().orElseThrow();
            throw m.error(missing, "give safe-height, pierce-height and cut-height together (a machine with a Z"
                    + " axis), or none of them");
        }
        if (given == HEIGHTS.size()) {
            try {
                heights = Optional.of(new MachineSettings.Heights(unit.toMm(m.notNegative("safe-height", 0)),
                        unit.toMm(m.notNegative("pierce-height", 0)), unit.toMm(m.notNegative("cut-height", 0))));
            } catch (JobFileException e) {
                throw e;
            } catch (IllegalArgumentException e) {
                throw m.error("safe-height", e.getMessage());
            }
        }
        return new MachineSettings(on, off, delay, header, footer, numbers, heights);
    }

    private static String code(Fields m, String key, String dflt) {
        if (!m.has(key)) {
            return dflt;
        }
        String c = m.string(key).strip().toUpperCase(Locale.ROOT);
        if (!MachineSettings.isMCode(c)) {
            throw m.error(key, "must be an M-code such as M03 (M and 1 to 3 digits), got '" + m.string(key) + "'");
        }
        return c;
    }

    private static List<String> lines(Fields m, String key, List<String> dflt) {
        if (!m.has(key)) {
            return dflt;
        }
        Object raw = m.raw(key);
        List<Object> items = raw instanceof List<?> l ? new ArrayList<>(l) : List.of(raw);
        List<String> out = new ArrayList<>();
        for (Object o : items) {
            String line = String.valueOf(o);
            if (!(o instanceof String || o instanceof Number) || !line.matches("[\\x20-\\x7e]{1,120}")) {
                throw m.error(key, "must be a list of program lines, each 1 to 120 printable ASCII characters, got '"
                        + o + "'");
            }
            out.add(line);
        }
        return out;
    }
}
