/**
 * The cut program of one sheet: which contour is cut when ({@link dev.sheetwright.core.cutpath.CutOrder}), where
 * each contour is entered and left ({@link dev.sheetwright.core.cutpath.LeadPlacer}), the torch path offset by half
 * the kerf into scrap ({@link dev.sheetwright.core.cutpath.KerfOffset}), put together by
 * {@link dev.sheetwright.core.cutpath.CutPlanner} into a {@link dev.sheetwright.core.cutpath.SheetCutPlan}, and the
 * RS-274 text a table runs ({@link dev.sheetwright.core.cutpath.GcodeProgram}). Engine code: nothing here prints,
 * exits or writes files. Lengths are in the job's unit.
 */
package dev.sheetwright.core.cutpath;
