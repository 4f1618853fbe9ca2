package org.hobwright.api.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.Set;
import java.util.function.DoubleConsumer;
import org.hobwright.api.wizard.FieldType;
import org.junit.jupiter.api.Test;

/** The field table is consistent in itself, and the api records refuse exactly what it refuses. */
class FieldTableTest {
    private static final List<List<FieldDef>> TABLES = List.of(JobFields.all(), MachineFields.all(),
            TemplateFields.all());

    @Test
    void keysAreUniqueAndFormATree() {
        for (List<FieldDef> table : TABLES) {
            Set<String> keys = new HashSet<>();
            for (FieldDef f : table) {
                assertTrue(keys.add(f.key()), "twice: " + f.key());
            }
            for (String k : keys) {
                assertFalse(keys.stream().anyMatch(o -> o.startsWith(k + ".")), k + " is a value and an object");
            }
        }
    }

    @Test
    void everyDefaultFitsItsFieldAndSaysWhereItComesFrom() {
        for (List<FieldDef> table : TABLES) {
            for (FieldDef f : table) {
                FieldDefault d = f.dflt();
                assertFalse(d.source().isBlank(), f.key());
                assertFalse(f.label().isBlank() || f.help().isBlank(), f.key());
                if (f.required() && !d.hasValue()) {
                    assertTrue(d.origin() == FieldDefault.Origin.NONE || f == JobFields.GEAR_TOOTH_SYSTEM, f.key());
                }
                for (Units u : Units.values()) {
                    String v = d.value(u);
                    if (v.isEmpty()) {
                        continue;
                    }
                    if (f.numeric()) {
                        assertTrue(f.range().contains(f.unit().toCanonical(Double.parseDouble(v), u)), f.key() + " " + v);
                    } else if (f.type() == FieldType.BOOLEAN) {
                        assertTrue(v.equals("yes") || v.equals("no"), f.key());
                    } else if (!f.choices().isEmpty()) {
                        assertTrue(f.choices().contains(v), f.key() + " " + v);
                    }
                }
            }
        }
    }

    /** A template holds the job's cycle fields, the same definitions. */
    @Test
    void aTemplateHasTheJobsCycleFields() {
        for (FieldDef f : JobFields.cycle()) {
            assertEquals(Optional.of(f), TemplateFields.find(f.key()));
        }
    }

    // The records refuse a value just outside each limit of the table and accept the limit itself.

    private static GearSpec gear(int teeth, double alpha, double helix, double shift) {
        return new GearSpec("p", teeth, new Pitch.Module(1), alpha, helix, Hand.RIGHT, 10, shift, 0, "iso53-a",
                Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty(), OptionalInt.empty(),
                DrawingValues.NONE);
    }

    private static void limits(FieldDef f, DoubleConsumer build) {
        FieldRange r = f.range();
        double step = f.type() == FieldType.INTEGER ? 1 : 1e-9 * Math.max(1, Math.abs(r.max()));
        if (r.hasMin()) {
            if (!r.minOpen()) {
                build.accept(r.min());
            }
            double below = r.minOpen() ? r.min() : r.min() - (f.type() == FieldType.INTEGER ? 1 : 1e-9);
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> build.accept(below),
                    f.key() + " below");
            assertTrue(e.getMessage().contains(f.leaf()) || e.getMessage().contains("module")
                    || e.getMessage().contains("Pitch"), e.getMessage());
        }
        if (r.hasMax()) {
            build.accept(r.max());
            assertThrows(IllegalArgumentException.class, () -> build.accept(r.max() + step), f.key() + " above");
        }
    }

    @Test
    void theGearRecordFollowsTheTable() {
        limits(JobFields.GEAR_TEETH, v -> gear((int) v, 20, 0, 0));
        limits(JobFields.GEAR_PRESSURE_ANGLE, v -> gear(30, v, 0, 0));
        limits(JobFields.GEAR_HELIX_ANGLE, v -> gear(30, 20, v, 0));
        limits(JobFields.GEAR_PROFILE_SHIFT, v -> gear(30, 20, 0, v));
        limits(JobFields.GEAR_MODULE, Pitch.Module::new);
        limits(JobFields.GEAR_DIAMETRAL_PITCH, Pitch.Diametral::new);
        limits(JobFields.GEAR_CUSTOM_ADDENDUM, v -> new ToothProportions(v, 3, 0.2));
        limits(JobFields.GEAR_CUSTOM_ROOT_RADIUS, v -> new ToothProportions(1, 1.25, v));
    }

    @Test
    void theHobAndCycleRecordsFollowTheTable() {
        limits(JobFields.HOB_STARTS, v -> new HobSpec(new Pitch.Module(1), 20, (int) v, Hand.RIGHT, 30,
                OptionalDouble.empty(), OptionalDouble.empty(), 12, 30, OptionalDouble.empty(), "hss"));
        limits(JobFields.HOB_GASHES, v -> new HobSpec(new Pitch.Module(1), 20, 1, Hand.RIGHT, 30,
                OptionalDouble.empty(), OptionalDouble.empty(), (int) v, 30, OptionalDouble.empty(), "hss"));
        limits(JobFields.TARGET_FEED_MARK_DEPTH, v -> new QualityTargets(OptionalDouble.of(v), OptionalDouble.empty(),
                OptionalDouble.empty()));
        limits(MachineFields.SWIVEL_MAX_ANGLE, v -> new SwivelHolder(SwivelHolder.SwivelScale.DECIMAL_DEGREES, 0.01,
                false, v, "words", true));
    }

    /** 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959): 250 ft/min = 76.2 m/min. */
    @Test
    void cuttingSpeedConvertsByTheFoot() {
        assertEquals(76.2, Units.IN.cuttingSpeedToMPerMin(250), 1e-12);
        assertEquals(250, Units.IN.cuttingSpeedFromMPerMin(76.2), 1e-12);
        assertEquals(80, Units.MM.cuttingSpeedToMPerMin(80), 0);
        assertEquals(76.2, UnitKind.CUTTING_SPEED.toCanonical(250, Units.IN), 1e-12);
        assertEquals(25.4, UnitKind.FEED.toCanonical(1, Units.IN), 0);
        assertEquals(2, UnitKind.MICROMETRE.toCanonical(2, Units.IN), 0, "quality values are µm in every file");
    }
}
