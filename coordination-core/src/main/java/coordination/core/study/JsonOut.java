package coordination.core.study;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;

/**
 * A thin layer over jackson-core's streaming generator: two-space indent, keys in the order
 * written, a final newline, and a value that does not exist (NaN, an infinity) written as null.
 */
final class JsonOut {
    private static final JsonFactory FACTORY = JsonFactory.builder().build();

    private final StringWriter text = new StringWriter();
    private final JsonGenerator g;

    JsonOut() {
        try {
            g = FACTORY.createGenerator(text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        g.setPrettyPrinter(new DefaultPrettyPrinter()
                .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                .withArrayIndenter(new DefaultIndenter("  ", "\n")));
    }

    /** Something written to the generator; its only failure is a programming error or memory. */
    @FunctionalInterface
    interface Write {
        void run() throws IOException;
    }

    private JsonOut write(Write w) {
        try {
            w.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return this;
    }

    JsonOut startObject() {
        return write(g::writeStartObject);
    }

    JsonOut startObject(String key) {
        return write(() -> g.writeObjectFieldStart(key));
    }

    JsonOut endObject() {
        return write(g::writeEndObject);
    }

    JsonOut startArray() {
        return write(g::writeStartArray);
    }

    JsonOut startArray(String key) {
        return write(() -> g.writeArrayFieldStart(key));
    }

    JsonOut endArray() {
        return write(g::writeEndArray);
    }

    /** A number, or null where it does not exist. */
    JsonOut number(String key, double value) {
        return write(() -> {
            g.writeFieldName(key);
            value(value);
        });
    }

    JsonOut integer(String key, int value) {
        return write(() -> g.writeNumberField(key, value));
    }

    JsonOut text(String key, String value) {
        return write(() -> {
            if (value == null) {
                g.writeNullField(key);
            } else {
                g.writeStringField(key, value);
            }
        });
    }

    JsonOut bool(String key, boolean value) {
        return write(() -> g.writeBooleanField(key, value));
    }

    JsonOut nullValue(String key) {
        return write(() -> g.writeNullField(key));
    }

    /** A number as an array element, or null where it does not exist. */
    JsonOut element(double value) {
        return write(() -> value(value));
    }

    /** A text as an array element. */
    JsonOut element(String value) {
        return write(() -> g.writeString(value));
    }

    /** {@code [from, to]}. */
    JsonOut pair(String key, double from, double to) {
        return startArray(key).element(from).element(to).endArray();
    }

    /** A list of numbers. */
    JsonOut numbers(String key, double[] values) {
        startArray(key);
        for (double v : values) {
            element(v);
        }
        return endArray();
    }

    private void value(double v) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumber(v);
        } else {
            g.writeNull();
        }
    }

    /** @return the document, ending with a newline */
    String finish() {
        write(g::close);
        return text + "\n";
    }
}
