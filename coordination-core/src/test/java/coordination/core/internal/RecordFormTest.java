package coordination.core.internal;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.Serial;
import java.io.Serializable;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class RecordFormTest {
    /** A record with every kind of optional, each present or absent, and a list. */
    record WithOptionals(String id, Optional<String> note, OptionalDouble value, OptionalInt count, List<Double> xs)
            implements Serializable {
        WithOptionals {
            xs = List.copyOf(xs);
        }

        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }
    }

    static Stream<WithOptionals> values() {
        return Stream.of(new WithOptionals("a", Optional.empty(), OptionalDouble.empty(), OptionalInt.empty(), List.of()),
                new WithOptionals("b", Optional.of("n"), OptionalDouble.of(-0.0), OptionalInt.of(3), List.of(1.0, 2.5)),
                new WithOptionals("c", Optional.of(""), OptionalDouble.of(Double.MIN_VALUE), OptionalInt.empty(),
                        List.of(Double.MAX_VALUE)));
    }

    @ParameterizedTest
    @MethodSource("values")
    void aRecordWithOptionalsComesBackEqual(WithOptionals v) throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(v);
        }
        Object back;
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            back = in.readObject();
        }
        assertThat(back, is(v));
    }
}
