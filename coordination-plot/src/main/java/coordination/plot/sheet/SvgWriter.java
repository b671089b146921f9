package coordination.plot.sheet;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.w3c.dom.Attr;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.Node;

/**
 * Writes the SVG generator's element tree as the platform's XML identity transform does, byte for
 * byte, for the nodes the generator makes: elements, attributes and text. The transform cost a
 * cold sheet about 20 ms, most of it finding and configuring its serializer, and the tree needs
 * none of what it offers. {@code SvgWriterTest} holds the two side by side.
 */
final class SvgWriter {
    private static final Comparator<Attr> BY_NAME = Comparator.comparing(Attr::getName);

    private SvgWriter() {
    }

    /**
     * The document of one root element, with the XML declaration the transform writes.
     *
     * @param root the root element
     * @return the document's text
     * @throws IllegalArgumentException if the tree holds a node the generator never makes
     */
    static String write(Element root) {
        StringBuilder out = new StringBuilder(1 << 16);
        out.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>");
        element(root, null, out);
        return out.toString();
    }

    /**
     * Writes an element.
     *
     * @param scope the default namespace its parent declared, or null
     */
    private static void element(Element e, String scope, StringBuilder out) {
        String name = e.getTagName();
        out.append('<').append(name);
        NamedNodeMap attrs = e.getAttributes();
        List<Attr> sorted = new ArrayList<>(attrs.getLength());
        for (int i = 0; i < attrs.getLength(); i++) {
            sorted.add((Attr) attrs.item(i));
        }
        // the platform's DOM keeps attributes in name order, and the transform writes them as kept
        sorted.sort(BY_NAME);
        for (Attr a : sorted) {
            out.append(' ').append(a.getName()).append("=\"");
            escape(a.getValue(), true, out);
            out.append('"');
        }
        // the generator names each element's namespace without declaring it; the transform declares it
        // where it changes, after the attributes
        String ns = e.getNamespaceURI();
        if (e.hasAttribute("xmlns")) {
            scope = e.getAttribute("xmlns");
        } else if (ns != null && e.getPrefix() == null && !ns.equals(scope)) {
            out.append(" xmlns=\"");
            escape(ns, true, out);
            out.append('"');
            scope = ns;
        }
        if (empty(e)) {
            out.append("/>");
            return;
        }
        out.append('>');
        for (Node child = e.getFirstChild(); child != null; child = child.getNextSibling()) {
            switch (child.getNodeType()) {
                case Node.ELEMENT_NODE -> element((Element) child, scope, out);
                case Node.TEXT_NODE -> escape(child.getNodeValue(), false, out);
                default -> throw new IllegalArgumentException("SVG: a node of type " + child.getNodeType()
                        + " in <" + name + ">, which the sheet's writer does not write");
            }
        }
        out.append("</").append(name).append('>');
    }

    /** No children, or only empty text, which the transform writes as an empty element too. */
    private static boolean empty(Element e) {
        for (Node child = e.getFirstChild(); child != null; child = child.getNextSibling()) {
            if (child.getNodeType() != Node.TEXT_NODE || !child.getNodeValue().isEmpty()) {
                return false;
            }
        }
        return true;
    }

    private static void escape(String s, boolean attribute, StringBuilder out) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append(attribute ? "&quot;" : "\"");
                case '\n' -> out.append(attribute ? "&#10;" : "\n");
                case '\t' -> out.append(attribute ? "&#9;" : "\t");
                default -> {
                    if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                        // the transform writes a character beyond the first plane as a reference
                        out.append("&#").append(Character.toCodePoint(c, s.charAt(++i))).append(';');
                    } else if (c < 0x20 || (!attribute && c >= 0x7F && c <= 0x9F)) {
                        out.append("&#").append((int) c).append(';');
                    } else {
                        out.append(c);
                    }
                }
            }
        }
    }
}
