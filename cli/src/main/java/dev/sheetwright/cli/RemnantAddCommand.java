package dev.sheetwright.cli;

import dev.sheetwright.cli.mixin.InventoryOption;
import dev.sheetwright.cli.mixin.UnitsOption;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.inventory.DxfOutline;
import dev.sheetwright.inventory.NewRemnant;
import dev.sheetwright.inventory.Remnant;
import dev.sheetwright.inventory.RemnantOutline;
import dev.sheetwright.inventory.RemnantSource;
import dev.sheetwright.inventory.RemnantStore;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code remnant add}: records one offcut and prints its new id for the label. */
@Command(name = "add", mixinStandardHelpOptions = true,
        description = "Record an offcut on the rack; prints its id (e.g. R-0042) for the label.",
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {ExitCodes.LIST_OK, ExitCodes.LIST_FAILURE, ExitCodes.LIST_BAD_INPUT})
public final class RemnantAddCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    InventoryOption inventory;

    @Mixin
    UnitsOption units;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Shape shape;

    static final class Shape {
        @Option(names = "--size", paramLabel = "WxH", description = "Rectangle, e.g. 48x30 (in --units).")
        String size;

        @Option(names = "--polygon", paramLabel = "\"X,Y X,Y ...\"",
                description = "Corners of a straight-sided offcut, in order (in --units).")
        String polygon;

        @Option(names = "--from-dxf", paramLabel = "FILE",
                description = "Largest closed polyline on layer SHEET (else CUT) of an ASCII DXF file; "
                        + "read in the drawing's units ($INSUNITS), millimetres if unset.")
        Path dxf;
    }

    @Option(names = "--material", required = true, paramLabel = "MATERIAL",
            description = "galvanized | steel | stainless | aluminum")
    String material;

    @Option(names = "--gauge", paramLabel = "GA", description = "Gauge number (give --gauge, --thickness or both).")
    Integer gauge;

    @Option(names = "--thickness", paramLabel = "T",
            description = "Thickness in --units, or with its own unit: 0.8mm, 0.031in.")
    String thickness;

    @Option(names = "--location", paramLabel = "TEXT", defaultValue = "",
            description = "Where it is kept, e.g. a rack slot.")
    String location;

    @Override
    public Integer call() {
        return ExitCodes.run(spec, () -> {
            MaterialType m = MaterialType.parse(material);
            Double thicknessMm = thickness == null ? null
                    : SizeText.parseLength("--thickness", thickness, units.unit());
            RemnantOutline outline = outline();
            NewRemnant remnant = new NewRemnant(m, gauge, thicknessMm, outline, location,
                    RemnantSource.manual());
            try (RemnantStore store = inventory.open()) {
                Remnant added = store.add(remnant);
                spec.commandLine().getOut().println("added " + added.id() + ": " + m.word() + " "
                        + SizeFormat.length(added.widthMm(), units.unit()) + " x "
                        + SizeFormat.length(added.heightMm(), units.unit()) + " " + units.unit().symbol()
                        + (added.location().isEmpty() ? "" : " at " + added.location()));
            }
            return ExitCodes.OK;
        });
    }

    private RemnantOutline outline() {
        if (shape.dxf != null) {
            return DxfOutline.read(shape.dxf);
        }
        if (shape.size != null) {
            double[] wh = SizeText.parseSize(shape.size, units.unit());
            try {
                return RemnantOutline.rectangle(wh[0], wh[1]);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("--size '" + shape.size + "' " + units.unit().symbol()
                        + ": " + e.getMessage(), e);
            }
        }
        try {
            return RemnantOutline.parse(shape.polygon, units.unit());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--polygon (" + units.unit().symbol() + "): "
                    + e.getMessage(), e);
        }
    }
}
