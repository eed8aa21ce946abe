package dev.sheetwright.nest.overlap;

import java.util.List;
import java.util.SplittableRandom;

import dev.sheetwright.nest.model.RotationRule;

/**
 * The rotations the search may give a piece: any angle (sampled uniformly and refined continuously), or exactly the
 * listed angles of a {@link RotationRule.Step} or {@link RotationRule.Angles} rule.
 */
record AngleSet(boolean free, double[] angles) {
    /** First turn tried when a free angle is refined, in degrees. */
    static final double FREE_REFINE_STEP_DEG = 8;

    static AngleSet of(RotationRule rule) {
        if (rule instanceof RotationRule.Free) {
            return new AngleSet(true, new double[] {0, 90, 180, 270});
        }
        return new AngleSet(false, toArray(rule.candidateAngles()));
    }

    private static double[] toArray(List<Double> l) {
        double[] a = new double[l.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = l.get(i);
        }
        return a;
    }

    /** A random allowed angle (free: uniform in [0, 360) half of the time, else one of the quarter turns). */
    double sample(SplittableRandom rnd) {
        if (free && rnd.nextBoolean()) {
            return rnd.nextDouble() * 360.0;
        }
        return angles[rnd.nextInt(angles.length)];
    }
}
