package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.ElbowSpec;
import dev.sheetwright.core.fitting.OffsetSpec;
import dev.sheetwright.core.fitting.SeamKind;
import dev.sheetwright.core.job.Job;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Job-level defaults reach each fitting family's reader. */
class JobReaderTest {

    private static final double EPS = 1e-12;
    private static final String HEAD = "job: t\nunits: in\nmaterial: {type: galvanized, gauge: 24}\n";

    @Test
    void miterAllowance_asAJobDefault_reachesElbowsAndOffsets_fittingsMayOverride() {
        Job job = JobReader.parse(HEAD + "allowances: {miter: lap 3/8}\nfittings:\n"
                + "  - {id: E1, type: elbow, diameter: 8, angle: 90}\n"
                + "  - {id: O1, type: offset, diameter: 8, offset: 6, angle: 45}\n"
                + "  - {id: E2, type: elbow, diameter: 8, angle: 90, allowances: {miter: lap 1/4}}\n", "t.yaml");
        ElbowSpec e1 = (ElbowSpec) job.fittings().get(0);
        OffsetSpec o1 = (OffsetSpec) job.fittings().get(1);
        ElbowSpec e2 = (ElbowSpec) job.fittings().get(2);
        assertEquals(SeamKind.LAP, e1.miterSeam().kind());
        assertEquals(0.375, e1.miterSeam().right(), EPS);
        assertEquals(0.375, o1.miterSeam().right(), EPS);
        assertEquals(0.25, e2.miterSeam().right(), EPS);
    }

    @Test
    void miterAllowance_onAPipe_isStillAnUnknownField() {
        JobFileException e = assertThrows(JobFileException.class, () -> JobReader.parse(HEAD + "fittings:\n"
                + "  - {id: P1, type: pipe, diameter: 8, length: 10, allowances: {miter: lap 1/4}}\n", "t.yaml"));
        assertTrue(e.getMessage().contains("fitting 'P1', field 'allowances.miter': unknown field"), e.getMessage());
    }
}
