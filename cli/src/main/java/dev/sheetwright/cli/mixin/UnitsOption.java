package dev.sheetwright.cli.mixin;

import dev.sheetwright.inventory.LengthUnit;
import java.util.Locale;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Option;
import picocli.CommandLine.TypeConversionException;

/** {@code --units in|mm}: the unit of sizes typed on the command line and shown in tables (default in). */
public final class UnitsOption {
    @Option(names = "--units", paramLabel = "in|mm", converter = UnitConverter.class, defaultValue = "in",
            description = "Unit of sizes typed and shown: in or mm (default: ${DEFAULT-VALUE}).")
    private LengthUnit unit = LengthUnit.IN;

    public LengthUnit unit() {
        return unit;
    }

    /** The unit's short word: {@code in} or {@code mm}. */
    public static String word(LengthUnit unit) {
        return unit.name().toLowerCase(Locale.ROOT);
    }

    /** Reads {@code in} or {@code mm}, ignoring case. */
    public static final class UnitConverter implements ITypeConverter<LengthUnit> {
        @Override
        public LengthUnit convert(String value) {
            return switch (value.strip().toLowerCase(Locale.ROOT)) {
                case "in", "inch", "inches" -> LengthUnit.IN;
                case "mm" -> LengthUnit.MM;
                default -> throw new TypeConversionException("'" + value + "' is not a unit; expected in or mm");
            };
        }
    }
}
