package dev.sheetwright.nest.model;

import java.util.ArrayList;
import java.util.List;

/**
 * Which rotations a part may take. Angles are in degrees, counter-clockwise, normalised to [0, 360).
 * {@link #candidateAngles()} is the finite set the placer tries; {@link #allows(double, double)} is what a
 * checker accepts.
 */
public sealed interface RotationRule {

    /** The angles the placer tries, each in [0, 360), no duplicates. */
    List<Double> candidateAngles();

    /** Whether {@code angleDeg} is allowed, within {@code toleranceDeg}. */
    boolean allows(double angleDeg, double toleranceDeg);

    /** Any angle; the placer samples every {@code sampleStepDeg} degrees. */
    record Free(double sampleStepDeg) implements RotationRule {
        public Free {
            if (!(sampleStepDeg > 0 && sampleStepDeg <= 360)) {
                throw new IllegalArgumentException("sampleStepDeg must be in (0, 360], got " + sampleStepDeg);
            }
        }

        @Override
        public List<Double> candidateAngles() {
            return Step.multiples(sampleStepDeg);
        }

        @Override
        public boolean allows(double angleDeg, double toleranceDeg) {
            return Double.isFinite(angleDeg);
        }
    }

    /** Multiples of {@code stepDeg}. */
    record Step(double stepDeg) implements RotationRule {
        public Step {
            if (!(stepDeg > 0 && stepDeg <= 360)) {
                throw new IllegalArgumentException("stepDeg must be in (0, 360], got " + stepDeg);
            }
        }

        static List<Double> multiples(double step) {
            List<Double> out = new ArrayList<>();
            for (int i = 0; i * step < 360 - NestPrecision.ANGLE_DEG; i++) {
                out.add(i * step);
            }
            return List.copyOf(out);
        }

        @Override
        public List<Double> candidateAngles() {
            return multiples(stepDeg);
        }

        @Override
        public boolean allows(double angleDeg, double toleranceDeg) {
            double n = normalize(angleDeg);
            double k = Math.rint(n / stepDeg);
            return Math.abs(n - k * stepDeg) <= toleranceDeg || Math.abs(360 - n) <= toleranceDeg;
        }
    }

    /** An explicit list of allowed angles, e.g. [0, 180]. */
    record Angles(List<Double> anglesDeg) implements RotationRule {
        public Angles {
            if (anglesDeg == null || anglesDeg.isEmpty()) {
                throw new IllegalArgumentException("anglesDeg must list at least one angle, got " + anglesDeg);
            }
            List<Double> norm = new ArrayList<>();
            for (Double a : anglesDeg) {
                if (a == null || !Double.isFinite(a)) {
                    throw new IllegalArgumentException("anglesDeg must hold finite angles, got " + a);
                }
                double n = normalize(a);
                if (!norm.contains(n)) {
                    norm.add(n);
                }
            }
            anglesDeg = List.copyOf(norm);
        }

        @Override
        public List<Double> candidateAngles() {
            return anglesDeg;
        }

        @Override
        public boolean allows(double angleDeg, double toleranceDeg) {
            double n = normalize(angleDeg);
            for (double a : anglesDeg) {
                double d = Math.abs(n - a);
                if (Math.min(d, 360 - d) <= toleranceDeg) {
                    return true;
                }
            }
            return false;
        }
    }

    static RotationRule free() {
        return new Free(15);
    }

    static RotationRule step(double deg) {
        return new Step(deg);
    }

    static RotationRule quarter() {
        return new Angles(List.of(0.0, 90.0, 180.0, 270.0));
    }

    static RotationRule none() {
        return new Angles(List.of(0.0));
    }

    static RotationRule angles(double... deg) {
        List<Double> l = new ArrayList<>();
        for (double d : deg) {
            l.add(d);
        }
        return new Angles(l);
    }

    /** Angle in [0, 360). */
    static double normalize(double deg) {
        double n = deg % 360.0;
        if (n < 0) {
            n += 360.0;
        }
        return n == 360.0 ? 0.0 : n;
    }
}
