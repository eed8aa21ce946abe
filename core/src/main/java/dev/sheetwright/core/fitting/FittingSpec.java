package dev.sheetwright.core.fitting;

/** One line of a shop ticket: a fitting of some type, its sizes, quantity and allowances. */
public sealed interface FittingSpec permits PipeSpec, ReducerSpec, EccentricReducerSpec, ElbowSpec, OffsetSpec,
        TeeSpec, TransitionSpec, RectDuctSpec, RectElbowSpec, RectOffsetSpec, RectTransitionSpec, ShoeTapSpec,
        EndCapSpec {

    /** Unique id of the fitting within the job. */
    String id();

    /** How many of this fitting the job needs. */
    int qty();

    /** Number of pieces the blank is split into around the stretch-out (1 = one-piece wrap). */
    int pieces();

    Allowances allowances();

    /** The job-file word for this type. */
    String type();

    static void requirePositive(String id, String field, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new FittingException(id, field, "must be a positive length, got " + value);
        }
    }

    static void requireCommon(String id, int qty, int pieces, Allowances allowances) {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("fitting id must not be blank");
        }
        if (qty < 1) {
            throw new FittingException(id, "qty", "must be at least 1, got " + qty);
        }
        if (pieces < 1 || pieces > 16) {
            throw new FittingException(id, "pieces", "must be from 1 to 16, got " + pieces);
        }
        if (allowances == null) {
            throw new FittingException(id, "allowances", "must not be null");
        }
    }
}
