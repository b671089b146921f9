package coordination.core.study;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** A node of a parsed study file with its location: a mapping, a sequence or a scalar. */
sealed interface Node permits Node.MapNode, Node.ListNode, Node.Scalar {
    /** @return 1-based line of the node's start */
    int line();

    /** @return 1-based column of the node's start */
    int column();

    /** @return a word for the kind of node, for messages */
    String kindName();

    /**
     * A key of a mapping with its own location.
     *
     * @param name the key
     * @param line 1-based line
     * @param column 1-based column
     * @param value the value node
     */
    record Entry(String name, int line, int column, Node value) {
    }

    /**
     * A mapping in file order.
     *
     * @param line line
     * @param column column
     * @param entries entries by key, in file order
     */
    record MapNode(int line, int column, LinkedHashMap<String, Entry> entries) implements Node {
        @Override
        public String kindName() {
            return "a mapping";
        }

        Map<String, Entry> map() {
            return entries;
        }
    }

    /**
     * A sequence.
     *
     * @param line line
     * @param column column
     * @param items the items
     */
    record ListNode(int line, int column, List<Node> items) implements Node {
        @Override
        public String kindName() {
            return "a list";
        }
    }

    /** Kinds of scalar as YAML resolved them. */
    enum ScalarType { STRING, NUMBER, BOOLEAN, NULL }

    /**
     * A scalar.
     *
     * @param line line
     * @param column column
     * @param text its text
     * @param type how YAML resolved it
     * @param number its value when a number
     */
    record Scalar(int line, int column, String text, ScalarType type, double number) implements Node {
        @Override
        public String kindName() {
            return switch (type) {
                case STRING -> "'" + Binder.echo(text) + "'";
                case NUMBER -> Binder.echo(text);
                case BOOLEAN -> Binder.echo(text);
                case NULL -> "nothing";
            };
        }
    }
}
