package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.lodestep.cli.Main;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

/** Runs a command in-process and reads the HTML report it wrote, for the report tests of each analysis. */
final class ReportCli {
    static final String XHTML = "http://www.w3.org/1999/xhtml";
    static final String SVG = "http://www.w3.org/2000/svg";

    private ReportCli() {
    }

    /** Output of one command: exit code, standard output and error. */
    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Run(code, out.toString(), err.toString());
    }

    /** Runs the command, expects {@code code}, and parses the report it wrote with the JDK's XML parser. */
    static Document report(Path html, int code, String... args) throws Exception {
        Run r = run(args);
        assertEquals(code, r.code(), "exit code; stderr: " + r.err());
        return parse(Files.readString(html));
    }

    static Document parse(String markup) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(new InputSource(new StringReader(markup)));
    }

    static List<String> texts(Document d, String ns, String tag) {
        NodeList nl = d.getElementsByTagNameNS(ns, tag);
        List<String> out = new ArrayList<>();
        for (int i = 0; i < nl.getLength(); i++) {
            out.add(nl.item(i).getTextContent());
        }
        return out;
    }

    static int count(Document d, String ns, String tag) {
        return d.getElementsByTagNameNS(ns, tag).getLength();
    }

    /** The class attribute of the verdict banner (the first section). */
    static String verdictClass(Document d) {
        return ((org.w3c.dom.Element) d.getElementsByTagNameNS(XHTML, "section").item(0)).getAttribute("class");
    }
}
