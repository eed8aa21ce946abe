package dev.sheetwright.core.cutpath;

/** Whether a cut contour frees a part (its outline) or takes a hole out of it. */
public enum ContourRole {
    HOLE, OUTLINE
}
