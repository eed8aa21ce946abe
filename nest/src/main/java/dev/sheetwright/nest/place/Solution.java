package dev.sheetwright.nest.place;

import java.util.List;

/** A finished layout in the placer's terms (instances, orientation ids, reference positions). */
record Solution(List<BinPlan> bins, List<Integer> unplaced, Layouter.Score score) {
    record BinPlan(Slot slot, int[] instances, int[] orientations, double[] x, double[] y, double usedExtent) {
    }
}
