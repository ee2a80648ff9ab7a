package dev.plumb.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.xml.sax.InputSource;

/** MathML markup read back with the JDK's XML parser, so that tests assert on elements, not on strings. */
final class MathDom {
    private MathDom() {
    }

    /** The root {@code math} element; fails the test when the markup is not well-formed MathML. */
    static Element parse(String markup) {
        try {
            DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
            f.setNamespaceAware(true);
            f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            Element root = f.newDocumentBuilder().parse(new InputSource(new StringReader(markup))).getDocumentElement();
            assertEquals("math", root.getLocalName());
            assertEquals(MathElements.NAMESPACE, root.getNamespaceURI());
            return root;
        } catch (Exception e) {
            return fail("not well-formed: " + e.getMessage() + "\n" + markup);
        }
    }

    /** Every element named {@code tag} under {@code root}, in document order. */
    static List<Element> all(Element root, String tag) {
        List<Element> out = new ArrayList<>();
        var nodes = root.getElementsByTagNameNS(MathElements.NAMESPACE, tag);
        for (int i = 0; i < nodes.getLength(); i++) out.add((Element) nodes.item(i));
        return out;
    }

    static Element only(Element root, String tag) {
        List<Element> found = all(root, tag);
        assertEquals(1, found.size(), "one " + tag + " expected in " + root.getTextContent());
        return found.get(0);
    }

    /** The element children of an element (MathML's positional arguments: base and script, numerator and denominator). */
    static List<Element> children(Element e) {
        List<Element> out = new ArrayList<>();
        for (Node n = e.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element child) out.add(child);
        }
        return out;
    }

    /** The text of the {@code mi}, {@code mn}, {@code mo} and {@code mtext} leaves in order, one string per leaf. */
    static List<String> leaves(Element root) {
        List<String> out = new ArrayList<>();
        collect(root, out);
        return out;
    }

    private static void collect(Element e, List<String> out) {
        String name = e.getLocalName();
        if (name.equals("mi") || name.equals("mn") || name.equals("mo") || name.equals("mtext")) {
            out.add(e.getTextContent());
            return;
        }
        for (Element child : children(e)) collect(child, out);
    }

    /** The leaves joined with blanks: {@code "F = 0.5 ⋅ ρ"}, for a readable assertion on a whole formula. */
    static String reading(Element root) {
        return String.join(" ", leaves(root));
    }
}
