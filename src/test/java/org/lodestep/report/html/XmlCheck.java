package org.lodestep.report.html;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;

import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;

import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

/** Parses report markup with the JDK's XML parser, the outside judge of well-formedness in these tests. */
final class XmlCheck {
    static final String XHTML = "http://www.w3.org/1999/xhtml";
    static final String SVG = "http://www.w3.org/2000/svg";

    private XmlCheck() {
    }

    static Document parse(String markup) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        f.setExpandEntityReferences(false);
        DocumentBuilder b = f.newDocumentBuilder();
        b.setErrorHandler(null);
        return b.parse(new InputSource(new StringReader(markup)));
    }

    static List<Element> elements(Document d, String ns, String localName) {
        NodeList nl = d.getElementsByTagNameNS(ns, localName);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < nl.getLength(); i++) {
            out.add((Element) nl.item(i));
        }
        return out;
    }

    static List<String> texts(Document d, String ns, String localName) {
        List<String> out = new ArrayList<>();
        for (Element e : elements(d, ns, localName)) {
            out.add(e.getTextContent());
        }
        return out;
    }
}
