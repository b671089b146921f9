package coordination.core.study;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/**
 * The JSON Schemas of the study file, the report and the other JSON outputs, as shipped in this
 * jar: the same files as {@code spec/*.schema.json}, for tools that validate without the
 * repository at hand.
 */
public final class Schemas {
    private Schemas() {
    }

    /** @return the study-file schema (JSON Schema draft 2020-12), as text */
    public static String study() {
        return read("study.schema.json");
    }

    /** @return the report schema (JSON Schema draft 2020-12), as text */
    public static String report() {
        return read("report.schema.json");
    }

    /** @return the schema of {@code design --json} (JSON Schema draft 2020-12), as text */
    public static String design() {
        return read("design.schema.json");
    }

    /** @return the schema of {@code withstand --json}, as text */
    public static String withstand() {
        return read("withstand.schema.json");
    }

    /** @return the schema of {@code faults --json}, as text */
    public static String faults() {
        return read("faults.schema.json");
    }

    private static String read(String name) {
        try (InputStream in = Schemas.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("the jar lacks " + name + ": a broken build");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
