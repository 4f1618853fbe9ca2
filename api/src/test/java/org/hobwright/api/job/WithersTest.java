package org.hobwright.api.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.Set;
import java.util.TreeSet;
import org.hobwright.api.testkit.SampleJobs;
import org.junit.jupiter.api.Test;

/**
 * Every with-method of the job records changes the one component it names and keeps every other:
 * checked by reflection against the record's own components, with a changed value for each, so a
 * with-method that passes a value to the wrong component or forgets it cannot pass.
 */
class WithersTest {

    @Test
    void everyWithMethodChangesItsComponentOnly() throws ReflectiveOperationException {
        HobJob job = SampleJobs.helicalMetric();
        GearSpec g = job.gear();
        // the custom tooth system carries its own rack proportions (basic rack profile A, ISO 53:1998)
        GearSpec custom = new GearSpec(g.partName(), g.teeth(), g.pitch(), g.pressureAngleDeg(), g.helixAngleDeg(),
                g.hand(), g.faceWidthMm(), g.profileShift(), g.thicknessAllowanceMm(), "custom",
                Optional.of(new ToothProportions(1.0, 1.25, 0.38)), g.blankDiameterMm(), g.pinDiameterMm(),
                g.flankToleranceClass(), g.drawing());
        List<Object> samples = List.of(job, g, custom, job.hob(), job.machine(), job.cycle(),
                job.machine().swivel(), g.drawing());
        Set<String> unchanged = new TreeSet<>();
        Set<String> changed = new TreeSet<>();
        int checked = 0;
        for (Object sample : samples) {
            for (Method m : sample.getClass().getMethods()) {
                if (!m.getName().startsWith("with") || m.getParameterCount() != 1 || Modifier.isStatic(m.getModifiers())
                        || m.getReturnType() != sample.getClass()) {
                    continue;
                }
                checked++;
                String key = sample.getClass().getSimpleName() + "." + m.getName() + "("
                        + m.getParameterTypes()[0].getSimpleName() + ")";
                (changesOnlyItsComponent(sample, m) ? changed : unchanged).add(key);
            }
        }
        unchanged.removeAll(changed);
        assertTrue(checked >= 100, "with-methods found: " + checked);
        assertEquals(Set.of(), unchanged, "with-methods no changed value could be checked with");
    }

    @Test
    void aWithMethodKeepsTheRecordsChecks() {
        GearSpec gear = SampleJobs.helicalMetric().gear();
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> gear.withTeeth(0));
        assertTrue(e.getMessage().contains("teeth"), e.getMessage());
    }

    /** True when a changed value was taken; fails when the method touched another component. */
    private static boolean changesOnlyItsComponent(Object sample, Method m) throws ReflectiveOperationException {
        String name = Character.toLowerCase(m.getName().charAt(4)) + m.getName().substring(5);
        RecordComponent[] components = sample.getClass().getRecordComponents();
        RecordComponent c = Arrays.stream(components).filter(rc -> rc.getName().equals(name)).findFirst()
                .orElse(null);
        if (c == null) {
            fail(sample.getClass().getSimpleName() + "." + m.getName() + " names no component");
        }
        Object current = c.getAccessor().invoke(sample);
        Class<?> param = m.getParameterTypes()[0];
        List<Object> args;
        if (param == c.getType()) {
            args = candidates(current, param, 1);
        } else {
            Object base = unwrapped(current);
            args = new ArrayList<>(candidates(base == null ? seed(param) : base, param, 1));
            if (base == null) {
                args.add(0, seed(param));
            }
        }
        if (args.isEmpty() && current instanceof Optional<?> o && o.isEmpty()) {
            Type inner = ((ParameterizedType) c.getGenericType()).getActualTypeArguments()[0];
            args = List.of(Optional.of(seed((Class<?>) inner)));
        }
        for (Object arg : args) {
            Object result;
            try {
                result = m.invoke(sample, arg);
            } catch (InvocationTargetException e) {
                if (e.getCause() instanceof IllegalArgumentException) {
                    continue;
                }
                throw e;
            }
            Object expected = param == c.getType() ? arg : wrapped(c.getType(), arg);
            for (RecordComponent other : components) {
                Object now = other.getAccessor().invoke(result);
                Object want = other == c ? expected : other.getAccessor().invoke(sample);
                assertEquals(want, now, sample.getClass().getSimpleName() + "." + m.getName() + "(" + arg + ") → "
                        + other.getName());
            }
            if (!expected.equals(current)) {
                return true;
            }
        }
        return false;
    }

    /** A value of a type for a component that is empty in the samples. */
    private static Object seed(Class<?> type) {
        if (type == String.class) {
            return "changed";
        }
        if (type.isEnum()) {
            return type.getEnumConstants()[0];
        }
        if (type == ToothProportions.class) {
            // basic rack profile A: h_aP = 1.0 m, h_fP = 1.25 m, rho_fP = 0.38 m (ISO 53:1998, Table 2)
            return new ToothProportions(1.0, 1.25, 0.38);
        }
        if (type == MatingGear.class) {
            return new MatingGear(31, OptionalDouble.of(0.1), OptionalDouble.of(52), -0.05, OptionalDouble.of(-0.12));
        }
        if (type == SplineSpec.class) {
            // an ISO 4156-1 spline, 30° flat root, class 5, fit h
            return new SplineSpec("iso4156", "flat", 5, "h", OptionalDouble.empty(), OptionalDouble.empty(),
                    OptionalDouble.empty(), OptionalDouble.empty());
        }
        if (type == SplineHobProfile.class) {
            return new SplineHobProfile("flat", 0.2, OptionalDouble.empty());
        }
        throw new AssertionError("no value to try for " + type);
    }

    private static Object unwrapped(Object value) {
        if (value instanceof OptionalDouble o) {
            return o.isPresent() ? o.getAsDouble() : 1.0;
        }
        if (value instanceof OptionalInt o) {
            return o.isPresent() ? o.getAsInt() : 1;
        }
        if (value instanceof Optional<?> o) {
            return o.orElse(null);
        }
        return value;
    }

    private static Object wrapped(Class<?> type, Object value) {
        if (type == OptionalDouble.class) {
            return OptionalDouble.of((Double) value);
        }
        if (type == OptionalInt.class) {
            return OptionalInt.of((Integer) value);
        }
        if (type == Optional.class) {
            return Optional.of(value);
        }
        throw new AssertionError("cannot wrap into " + type);
    }

    /** Values of a type other than {@code v}, to try one after the other (some may be out of range). */
    private static List<Object> candidates(Object v, Class<?> type, int depth) throws ReflectiveOperationException {
        List<Object> out = new ArrayList<>();
        if (type == double.class || type == Double.class) {
            double d = (Double) v;
            out.addAll(List.of(d * 1.01, d + 0.01, d - 0.01, d * 0.99, 0.5, 1.0, 10.0, -0.05));
        } else if (type == int.class || type == Integer.class) {
            int i = (Integer) v;
            out.addAll(List.of(i + 1, i - 1, 1, 2, 10));
        } else if (type == boolean.class || type == Boolean.class) {
            out.add(!(Boolean) v);
        } else if (type == String.class) {
            out.addAll(List.of(v + "-changed", "changed"));
        } else if (type.isEnum()) {
            Arrays.stream(type.getEnumConstants()).filter(e -> e != v).forEach(out::add);
        } else if (type == OptionalDouble.class) {
            OptionalDouble o = (OptionalDouble) v;
            for (Object d : candidates(o.isPresent() ? o.getAsDouble() : 1.0, double.class, depth)) {
                out.add(OptionalDouble.of((Double) d));
            }
            out.add(OptionalDouble.empty());
        } else if (type == OptionalInt.class) {
            OptionalInt o = (OptionalInt) v;
            for (Object i : candidates(o.isPresent() ? o.getAsInt() : 1, int.class, depth)) {
                out.add(OptionalInt.of((Integer) i));
            }
            out.add(OptionalInt.empty());
        } else if (type == Optional.class) {
            Optional<?> o = (Optional<?>) v;
            if (o.isPresent()) {
                out.add(Optional.empty());
                for (Object inner : candidates(o.get(), o.get().getClass(), depth)) {
                    out.add(Optional.of(inner));
                }
            }
        } else if (v != null && v.getClass().isRecord() && depth > 0) {
            out.addAll(changedRecords(v, depth - 1));
        }
        out.remove(v);
        return out;
    }

    /** Copies of a record with one component changed, through its canonical constructor. */
    private static List<Object> changedRecords(Object r, int depth) throws ReflectiveOperationException {
        RecordComponent[] rc = r.getClass().getRecordComponents();
        Class<?>[] types = Arrays.stream(rc).map(RecordComponent::getType).toArray(Class<?>[]::new);
        Constructor<?> canonical = r.getClass().getDeclaredConstructor(types);
        canonical.setAccessible(true);
        List<Object> out = new ArrayList<>();
        for (int i = 0; i < rc.length; i++) {
            Object[] args = new Object[rc.length];
            for (int j = 0; j < rc.length; j++) {
                args[j] = rc[j].getAccessor().invoke(r);
            }
            for (Object changed : candidates(args[i], types[i], depth)) {
                args[i] = changed;
                try {
                    out.add(canonical.newInstance(args));
                    break;
                } catch (InvocationTargetException e) {
                    // out of the record's range: the next candidate
                }
            }
        }
        return out;
    }
}
