package org.hobwright.samples.host;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class CycleImportTest {

    private static final String HEADER = CycleImport.VERSION_COLUMN + "," + CycleImport.KIND_COLUMN + ","
            + CycleImport.SECONDS_COLUMN + ",axial_mm,extra_column\n";

    @Test
    void readsColumnsByNameAndKeepsEveryValue() {
        List<Operation> ops = CycleImport.operations(HEADER + "2,rapid,0.5,-3.25,x\n2,feed,12.75,20,\n");
        assertEquals(2, ops.size());
        assertEquals("rapid", ops.get(0).kind());
        assertEquals(1, ops.get(0).sequence());
        assertEquals(12.75, ops.get(1).seconds());
        assertEquals(-3.25, ops.get(0).number("axial_mm").orElseThrow());
        assertTrue(ops.get(1).number("extra_column").isEmpty());
        assertTrue(ops.get(0).describe().contains("rapid"));
    }

    @Test
    void refusesAnotherFormatVersionNamingTheLine() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> CycleImport.operations(HEADER + "2,rapid,0.5,0,\n1,feed,1,2,\n"));
        assertTrue(e.getMessage().contains("line 3") && e.getMessage().contains("\"1\""), e.getMessage());
    }

    @Test
    void aMissingColumnIsNamed() {
        var e = assertThrows(IllegalArgumentException.class, () -> CycleImport.operations("kind\nrapid\n"));
        assertTrue(e.getMessage().contains(CycleImport.VERSION_COLUMN), e.getMessage());
    }
}
