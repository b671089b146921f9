package coordination.core.internal;

import java.io.InvalidObjectException;
import java.io.ObjectStreamException;
import java.io.Serial;
import java.io.Serializable;
import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The serial form of a record with {@code Optional} components, which Java serialization cannot write:
 * the components with each optional unwrapped, turned back into the record through its canonical
 * constructor, so that its checks run again on reading.
 *
 * <p>A record opts in with {@code @Serial private Object writeReplace() { return RecordForm.of(this); }}.
 */
public final class RecordForm implements Serializable {
    @Serial
    private static final long serialVersionUID = 1L;

    /** An absent {@code Optional}, {@code OptionalDouble} or {@code OptionalInt}. */
    private enum Absent {
        VALUE
    }

    /** A present {@code OptionalDouble}. */
    private record PresentDouble(double value) implements Serializable {
    }

    /** A present {@code OptionalInt}. */
    private record PresentInt(int value) implements Serializable {
    }

    /** A present {@code Optional}. */
    private record Present(Serializable value) implements Serializable {
    }

    /** @serial the record's class */
    private final Class<?> type;
    /** @serial the components in declaration order, optionals unwrapped */
    private final Object[] values;

    private RecordForm(Class<?> type, Object[] values) {
        this.type = type;
        this.values = values;
    }

    /**
     * The serial form of a record.
     *
     * @param record the record, whose components other than optionals are serializable
     * @return its serial form
     */
    public static RecordForm of(Record record) {
        RecordComponent[] components = record.getClass().getRecordComponents();
        Object[] values = new Object[components.length];
        for (int i = 0; i < components.length; i++) {
            Object v;
            try {
                v = components[i].getAccessor().invoke(record);
            } catch (IllegalAccessException | InvocationTargetException e) {
                throw new IllegalStateException("cannot read " + components[i].getName() + " of "
                        + record.getClass().getName(), e);
            }
            values[i] = wrap(v);
        }
        return new RecordForm(record.getClass(), values);
    }

    private static Object wrap(Object v) {
        if (v instanceof Optional<?> o) {
            return o.<Object>map(x -> new Present((Serializable) x)).orElse(Absent.VALUE);
        }
        if (v instanceof OptionalDouble o) {
            return o.isPresent() ? new PresentDouble(o.getAsDouble()) : Absent.VALUE;
        }
        if (v instanceof OptionalInt o) {
            return o.isPresent() ? new PresentInt(o.getAsInt()) : Absent.VALUE;
        }
        return v;
    }

    @Serial
    private Object readResolve() throws ObjectStreamException {
        if (type == null || !type.isRecord() || values == null) {
            throw new InvalidObjectException("not the serial form of a record");
        }
        RecordComponent[] components = type.getRecordComponents();
        if (components.length != values.length) {
            throw new InvalidObjectException(type.getName() + ": " + values.length + " values for "
                    + components.length + " components");
        }
        Class<?>[] types = new Class<?>[components.length];
        Object[] args = new Object[components.length];
        try {
            for (int i = 0; i < components.length; i++) {
                types[i] = components[i].getType();
                args[i] = unwrap(types[i], values[i]);
            }
            Constructor<?> canonical = type.getDeclaredConstructor(types);
            canonical.setAccessible(true);
            return canonical.newInstance(args);
        } catch (InvocationTargetException e) {
            InvalidObjectException bad = new InvalidObjectException(type.getName() + ": "
                    + e.getCause().getMessage());
            bad.initCause(e.getCause());
            throw bad;
        } catch (ReflectiveOperationException | IllegalArgumentException | ClassCastException e) {
            InvalidObjectException bad = new InvalidObjectException(type.getName() + ": " + e.getMessage());
            bad.initCause(e);
            throw bad;
        }
    }

    private static Object unwrap(Class<?> type, Object v) {
        if (type == Optional.class) {
            return v == Absent.VALUE ? Optional.empty() : Optional.of(((Present) v).value());
        }
        if (type == OptionalDouble.class) {
            return v == Absent.VALUE ? OptionalDouble.empty() : OptionalDouble.of(((PresentDouble) v).value());
        }
        if (type == OptionalInt.class) {
            return v == Absent.VALUE ? OptionalInt.empty() : OptionalInt.of(((PresentInt) v).value());
        }
        return v;
    }
}
