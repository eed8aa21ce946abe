package dev.sheetwright.cli.command;

import dev.sheetwright.cli.mixin.UnitsOption;
import dev.sheetwright.cli.output.SizeFormat;
import dev.sheetwright.cli.output.SizeText;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.inventory.DxfOutline;
import dev.sheetwright.inventory.NewRemnant;
import dev.sheetwright.inventory.Remnant;
import dev.sheetwright.inventory.RemnantOutline;
import dev.sheetwright.inventory.RemnantSource;
import java.io.PrintWriter;
import java.nio.file.Path;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code remnant add}: records one offcut and prints its new id for the label. */
@Command(name = "add", description = "Record an offcut on the rack; prints its id (e.g. R-0042) for the label.")
public final class RemnantAddCommand extends RemnantSubcommand {
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
    void run(PrintWriter out) {
        MaterialType m = MaterialType.parse(material);
        Double thicknessMm = thickness == null ? null
                : SizeText.parseLength("--thickness", thickness, units.unit());
        RemnantOutline outline = outline();
        NewRemnant remnant = new NewRemnant(m, gauge, thicknessMm, outline, location, RemnantSource.manual());
        Remnant added = inventory.applyCreating(store -> store.add(remnant));
        out.println("added " + added.id() + ": " + m.word() + " "
                + SizeFormat.length(added.widthMm(), units.unit()) + " x "
                + SizeFormat.length(added.heightMm(), units.unit()) + " " + units.unit().symbol()
                + (added.location().isEmpty() ? "" : " at " + added.location()));
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
