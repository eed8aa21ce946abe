package dev.sheetwright.cli;

import java.util.List;

/** The safety cautions printed with every output people cut and build from (trade-reference §10). */
public final class Cautions {

    public static final List<String> ALL = List.of(
            "Patterns are not approvals: check a first article. Gauges, seams, joints, reinforcement and sealing are"
                    + " set by the project specification, the adopted duct construction standard and the local"
                    + " mechanical code as enforced by the authority having jurisdiction, and by licensed practice.",
            "Cutting galvanized steel makes zinc oxide fume (metal fume fever; OSHA PEL 5 mg/m3): use extraction or"
                    + " a downdraft/water table, keep out of the plume, and wear a respirator where ventilation is"
                    + " uncertain.",
            "Plasma arcs give off UV/IR light, hot slag and sparks: filter shade 8 or darker for light plasma cutting"
                    + " where the arc is visible; keep the table clean of dust and oil.",
            "Cutting lasers are Class 4: keep enclosures and interlocks working and wear eyewear matched to the"
                    + " wavelength.",
            "Cut edges and burrs are sharp: gloves and sleeves, deburr; full sheets are heavy (a 48 x 120 in 24 ga"
                    + " sheet is about 46 lb): lift with two people or a lifter.");

    /** One line for terminal output. */
    public static final String SHORT = "Caution: check a first article; local codes and licensed practice govern duct"
            + " construction. Galvanized cutting fumes, arc/laser light and sharp edges: see README.";

    private Cautions() {
    }
}
