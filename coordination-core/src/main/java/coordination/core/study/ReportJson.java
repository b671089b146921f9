package coordination.core.study;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Map;

/** Writes report maps as JSON: two-space indent, keys in the order given, a final newline. */
public final class ReportJson {
    private static final ObjectMapper MAPPER = new ObjectMapper()
            .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS)
            .configure(JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN, true);

    private ReportJson() {
    }

    /**
     * Formats a JSON value.
     *
     * @param value maps, lists, strings, numbers, booleans and nulls
     * @return the JSON text ending with a newline
     */
    public static String write(Object value) {
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter()
                .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                .withArrayIndenter(new DefaultIndenter("  ", "\n"));
        try {
            return MAPPER.writer(printer).writeValueAsString(value) + "\n";
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Formats a report.
     *
     * @param report the report
     * @return its JSON text
     */
    public static String write(StudyReport report) {
        return write((Object) report.toJson());
    }

    /**
     * Formats a map.
     *
     * @param map the map
     * @return its JSON text
     */
    public static String write(Map<String, Object> map) {
        return write((Object) map);
    }
}
