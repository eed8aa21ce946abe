package dev.sheetwright.cli.mixin;

import dev.sheetwright.core.units.LengthUnit;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Option;
import picocli.CommandLine.TypeConversionException;

/** {@code --units in|mm}: the unit of sizes typed on the command line and shown in tables (default in). */
public final class UnitsOption {
    @Option(names = "--units", paramLabel = "in|mm", converter = UnitConverter.class, defaultValue = "in",
            description = "Unit of sizes typed and shown: in or mm (default: ${DEFAULT-VALUE}).")
    private LengthUnit unit = LengthUnit.INCH;

    public LengthUnit unit() {
        return unit;
    }

    /** Reads {@code in} or {@code mm} (or the words {@link LengthUnit#parse} knows), ignoring case. */
    public static final class UnitConverter implements ITypeConverter<LengthUnit> {
        @Override
        public LengthUnit convert(String value) {
            try {
                return LengthUnit.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException("'" + value + "' is not a unit; expected in or mm");
            }
        }
    }
}
