package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Point2;

/**
 * One contour of a sheet's program: pierce, lead-in, the loop, lead-out.
 *
 * @param part index of the part in the sheet's part list
 * @param hole index of the hole in the part, or -1 for the outline
 * @param nominal the drawn contour (as in the DXF), in cutting direction: outlines clockwise, holes
 *     counter-clockwise, so scrap is on the left of travel
 * @param toolpath the loop the torch centre follows, starting and ending where the lead-in ends
 */
public record CutStep(int part, int hole, ContourRole role, Contour nominal, Contour toolpath, Lead lead) {

    public CutStep {
        if (part < 0 || hole < -1 || role == null || nominal == null || toolpath == null || lead == null) {
            throw new IllegalArgumentException("cut step needs a part, a role, both contours and a lead");
        }
        if ((hole == -1) != (role == ContourRole.OUTLINE)) {
            throw new IllegalArgumentException("hole index -1 is the outline and only the outline");
        }
    }

    /** Where the torch is when this contour is done: the end of the lead-out, else the path start. */
    public Point2 exit() {
        return lead.leadOut().map(l -> l.end()).orElse(toolpath.edges().get(0).start());
    }
}
