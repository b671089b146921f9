package coordination.core.study;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.is;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The study schema's descriptions and defaults agree with {@code spec/study-format.md}, so that an editor's
 * hints and the format's text cannot drift apart: every property has a sentence, every key is documented,
 * every default the format's tables state is the schema's {@code default}, and every schema default is
 * stated beside its key in the format's text.
 */
class SchemaDocumentationTest {
    /** Keywords under which properties only restate the ones they constrain. */
    private static final Set<String> CONDITIONS = Set.of("if", "then", "else", "not", "allOf");
    /** Keys that make a property a definition rather than a restatement. */
    private static final Set<String> DEFINING = Set.of("type", "enum", "const", "$ref", "oneOf", "anyOf", "items");

    private static String format;
    private static List<Property> properties;

    record Property(String pointer, String key, JsonNode schema) {
    }

    @BeforeAll
    static void read() throws Exception {
        format = Files.readString(Path.of("../spec/study-format.md"), StandardCharsets.UTF_8);
        JsonNode schema = new ObjectMapper().readTree(Path.of("../spec/study.schema.json").toFile());
        properties = new ArrayList<>();
        collect(schema, "", properties);
    }

    private static void collect(JsonNode node, String pointer, List<Property> out) {
        if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                collect(node.get(i), pointer + "/" + i, out);
            }
            return;
        }
        if (!node.isObject()) {
            return;
        }
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            if (CONDITIONS.contains(e.getKey())) {
                continue;
            }
            if (e.getKey().equals("properties") && e.getValue().isObject()) {
                for (Map.Entry<String, JsonNode> prop : e.getValue().properties()) {
                    String at = pointer + "/properties/" + prop.getKey();
                    JsonNode v = prop.getValue();
                    if (v.isObject() && DEFINING.stream().anyMatch(v::has)) {
                        out.add(new Property(at, prop.getKey(), v));
                    }
                    collect(v, at, out);
                }
            } else {
                collect(e.getValue(), pointer + "/" + e.getKey(), out);
            }
        }
    }

    @Test
    void everyPropertyHasASentence() {
        assertThat(properties.size(), greaterThan(150));
        List<String> bare = new ArrayList<>();
        for (Property p : properties) {
            String d = p.schema().path("description").asText("");
            if (d.split("\\s+").length < 4 || !d.endsWith(".")) {
                bare.add(p.pointer() + ": '" + d + "'");
            }
        }
        assertThat("properties without a sentence", bare, is(empty()));
    }

    @Test
    void everyKeyIsDocumentedInTheFormat() {
        Set<String> missing = new LinkedHashSet<>();
        List<String> spans = new ArrayList<>();
        boolean fenced = false;
        for (String line : format.split("\n")) {
            if (line.startsWith("```")) {
                fenced = !fenced;
            } else if (fenced || line.startsWith("    ")) {
                spans.add(line); // the examples
            } else {
                // code spans, line by line: a stray backtick elsewhere must not shift them
                Matcher code = Pattern.compile("`([^`]+)`").matcher(line);
                while (code.find()) {
                    spans.add(code.group(1));
                }
            }
        }
        for (Property p : properties) {
            Pattern word = Pattern.compile("(?<![a-z_0-9])" + Pattern.quote(p.key()) + "(?![a-z_0-9])");
            if (spans.stream().noneMatch(t -> word.matcher(t).find())) {
                missing.add(p.key());
            }
        }
        assertThat("keys of the schema that study-format.md does not mention", missing, is(empty()));
    }

    /** A table row's cells, for tables with a {@code default} column. */
    private static List<String[]> rowsWithDefaults() {
        List<String[]> rows = new ArrayList<>();
        int keyColumn = -1;
        int defaultColumn = -1;
        for (String line : format.split("\n")) {
            if (!line.startsWith("|")) {
                keyColumn = -1;
                defaultColumn = -1;
                continue;
            }
            String[] cells = line.substring(1).split("\\|", -1);
            for (int i = 0; i < cells.length; i++) {
                cells[i] = cells[i].strip();
            }
            if (keyColumn < 0 && cells[0].equals("key")) {
                keyColumn = 0;
                defaultColumn = List.of(cells).indexOf("default");
                continue;
            }
            if (keyColumn >= 0 && defaultColumn > 0 && !cells[0].startsWith("---")) {
                rows.add(new String[] {cells[keyColumn], cells[defaultColumn]});
            }
        }
        return rows;
    }

    private static final Pattern KEY = Pattern.compile("`([a-z_0-9]+)`");
    /** A default cell that is one literal: a number, a word in backticks, a pair, or a boolean. */
    private static final Pattern LITERAL = Pattern.compile("-?[0-9.]+|`[a-z0-9-]+`|`\\[[0-9., ]+]`|true|false");

    @Test
    void theDefaultsOfTheFormatsTablesAreTheSchemasDefaults() throws Exception {
        ObjectMapper json = new ObjectMapper();
        List<String> wrong = new ArrayList<>();
        int compared = 0;
        for (String[] row : rowsWithDefaults()) {
            if (!LITERAL.matcher(row[1]).matches()) {
                continue;
            }
            String literal = row[1].replace("`", "");
            JsonNode expected = literal.matches("[a-z][a-z0-9-]*") && !literal.equals("true") && !literal.equals("false")
                    ? json.getNodeFactory().textNode(literal) : json.readTree(literal);
            Matcher keys = KEY.matcher(row[0]);
            while (keys.find()) {
                for (Property p : properties) {
                    if (!p.key().equals(keys.group(1)) || !sectionOf(p).equals(sectionOf(row[0]))) {
                        continue;
                    }
                    compared++;
                    JsonNode d = p.schema().get("default");
                    if (d == null || !sameValue(d, expected)) {
                        wrong.add(p.pointer() + ": the format says " + literal + ", the schema " + d);
                    }
                }
            }
        }
        assertThat(compared, greaterThan(10));
        assertThat(wrong, is(empty()));
    }

    /** The table a row came from, told by where it sits in the format; properties by their pointer. */
    private static String sectionOf(Object rowOrProperty) {
        if (rowOrProperty instanceof Property p) {
            String at = p.pointer();
            if (at.startsWith("/properties/cables/items/properties/load")) {
                return "load";
            }
            if (at.startsWith("/properties/cables/")) {
                return "cables";
            }
            if (at.startsWith("/properties/devices/items/oneOf/0/properties/stages")) {
                return "stages";
            }
            for (int i = 0; i < 4; i++) {
                if (at.startsWith("/properties/devices/items/oneOf/" + i + "/")) {
                    return "device-" + i;
                }
            }
            if (at.startsWith("/properties/checks/")) {
                return "checks";
            }
            if (at.startsWith("/properties/network/")) {
                return "network";
            }
            return at.indexOf('/', "/properties/".length()) < 0 ? "top" : "other";
        }
        String key = (String) rowOrProperty;
        int at = format.indexOf("| " + key + " |");
        String before = format.substring(0, at);
        String heading = before.substring(before.lastIndexOf("\n#") + 1);
        heading = heading.substring(0, heading.indexOf('\n'));
        return switch (heading) {
            case "## Top level" -> "top";
            case "## Cables" -> "cables";
            case "### `type: relay`" -> "device-0";
            case "### `type: fuse`" -> "device-1";
            case "### `type: breaker` (electronic trip unit)" -> "device-2";
            case "### `type: mcb` (IEC 60898-1)" -> "device-3";
            case "## Checks" -> "checks";
            default -> "other: " + heading;
        };
    }

    private static boolean sameValue(JsonNode a, JsonNode b) {
        if (a.isNumber() && b.isNumber()) {
            return a.decimalValue().compareTo(b.decimalValue()) == 0;
        }
        if (a.isArray() && b.isArray() && a.size() == b.size()) {
            for (int i = 0; i < a.size(); i++) {
                if (!sameValue(a.get(i), b.get(i))) {
                    return false;
                }
            }
            return true;
        }
        return a.equals(b);
    }

    @Test
    void everySchemaDefaultIsStatedBesideItsKeyInTheFormat() {
        List<String> unstated = new ArrayList<>();
        // paragraphs and table rows: a default counts as stated if one that names the key also holds the value
        List<String> blocks = new ArrayList<>();
        for (String paragraph : format.split("\n\\s*\n")) {
            blocks.addAll(paragraph.startsWith("|") ? List.of(paragraph.split("\n")) : List.of(paragraph));
        }
        for (Property p : properties) {
            JsonNode d = p.schema().get("default");
            if (d == null) {
                continue;
            }
            if (!p.schema().path("description").asText("").contains("default")) {
                unstated.add(p.pointer() + ": the description does not give the default");
            }
            List<List<String>> forms = forms(d);
            boolean stated = blocks.stream().anyMatch(b -> (b.contains("`" + p.key() + "`") || b.contains(p.key()
                    + ":")) && forms.stream().allMatch(alternatives -> alternatives.stream().anyMatch(f -> Pattern
                            .compile("(?<![0-9.])" + Pattern.quote(f) + "(?![0-9])").matcher(b).find())));
            if (!stated) {
                unstated.add(p.pointer() + ": default " + d + " is not stated beside `" + p.key() + "`");
            }
        }
        assertThat(unstated, is(empty()));
    }

    /** The text forms a default takes in the format: for each value of it, as written or with two decimals. */
    private static List<List<String>> forms(JsonNode d) {
        if (d.isArray()) {
            List<List<String>> all = new ArrayList<>();
            d.forEach(e -> all.addAll(forms(e)));
            return all;
        }
        if (d.isNumber()) {
            BigDecimal v = d.decimalValue().stripTrailingZeros();
            return List.of(List.of(v.toPlainString(), v.setScale(Math.max(2, v.scale())).toPlainString()));
        }
        return List.of(List.of(d.asText()));
    }
}
