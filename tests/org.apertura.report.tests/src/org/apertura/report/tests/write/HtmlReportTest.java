/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;

import org.apertura.report.Caution;
import org.apertura.report.internal.Html;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.Waiver;
import org.apertura.report.tests.ReportFixture;
import org.apertura.report.waiver.Waivers;
import org.apertura.report.write.HtmlReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class HtmlReportTest {

    @TempDir
    Path dir;

    static Document parse(String html) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(false);
        f.setValidating(false);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", false);
        DocumentBuilder b = f.newDocumentBuilder();
        b.setErrorHandler(null);
        return b.parse(new ByteArrayInputStream(html.getBytes(StandardCharsets.UTF_8)));
    }

    static ReportData waived(ReportData d) {
        Finding f = d.findings().stream().filter(x -> x.status() == FindingStatus.NEW).findFirst().orElseThrow();
        return Waivers.apply(d, List.of(Waiver.forFinding(f, "accepted <risk> & noted", "rev", LocalDate.of(2026, 3, 1))));
    }

    @Test
    void reportIsWellFormedAndSelfContained() throws Exception {
        String html = HtmlReport.render(waived(ReportFixture.migration(dir)));
        Document doc = parse(html);
        assertEquals("html", doc.getDocumentElement().getTagName());
        String lower = html.toLowerCase(Locale.ROOT);
        assertFalse(lower.contains("http:"), "no http URL");
        assertFalse(lower.contains("https:"), "no https URL");
        assertFalse(lower.contains("<script"), "no script");
        assertFalse(lower.contains("<img"), "no external image");
        assertFalse(lower.contains("<link"), "no linked resource");
        assertFalse(lower.contains("url("), "no CSS url()");
        Matcher m = Pattern.compile("(?:href|src)=\"([^\"]*)\"").matcher(html);
        while (m.find()) {
            assertTrue(m.group(1).startsWith("#"), "only in-page links: " + m.group(1));
        }
        assertTrue(html.contains(Html.esc(Caution.TEXT)));
        assertTrue(html.contains("accepted &lt;risk&gt; &amp; noted"));
    }

    @Test
    void reportShowsTheMatrixAndViolationPictures() throws Exception {
        ReportData d = waived(ReportFixture.migration(dir));
        Document doc = parse(HtmlReport.render(d));
        Element matrix = byClass(doc, "table", "matrix").get(0);
        String mt = matrix.getTextContent();
        assertTrue(mt.contains("14 \u2192 18 nm"), mt);
        assertTrue(mt.contains("tightened"), mt);
        assertTrue(mt.contains("+" + ReportFixture.M1_NEW + " new"), mt);
        assertTrue(mt.contains("k1 0.44\u2192"), mt);
        // one marker per finding in the layer pictures, plus those of the overview picture
        List<Element> markers = byClass(doc, "rect", "mk");
        long present = d.findings().size();
        assertTrue(markers.size() >= present, markers.size() + " markers");
        // a thumbnail per finding (fewer than the cap here)
        assertEquals(d.findings().size(), byClass(doc, "svg", "thumb").size());
        // waived and not waived are shown apart
        assertEquals("Waived (1)", text(doc, "h3", "waived"));
        assertEquals(d.openFindings().size(), rowsAfter(doc, "open"));
        assertEquals(d.histograms().size(), byClass(doc, "svg", "hist").size());
        assertEquals(1, byClass(doc, "svg", "field").size());
    }

    @Test
    void plainCheckHasACountTableInsteadOfTheMatrix() throws Exception {
        ReportData d = ReportFixture.check(dir);
        String html = HtmlReport.render(d);
        parse(html);
        assertTrue(html.contains("Findings by layer and rule"));
        assertFalse(html.contains("Layer \u00d7 rule matrix"));
    }

    @Test
    void largeLayoutsAreBounded() throws Exception {
        ReportData d = ReportFixture.large(dir, 3000);
        String html = HtmlReport.render(d);
        Document doc = parse(html);
        assertEquals(HtmlReport.MAX_THUMBNAILS, byClass(doc, "svg", "thumb").size());
        assertTrue(html.contains("Thumbnails are drawn for the first " + HtmlReport.MAX_THUMBNAILS));
        assertTrue(html.contains("coverage grid"));
        assertTrue(html.length() < 8_000_000, "size " + html.length());
    }

    static List<Element> byClass(Document doc, String tag, String cls) {
        NodeList nl = doc.getElementsByTagName(tag);
        List<Element> out = new java.util.ArrayList<>();
        for (int i = 0; i < nl.getLength(); i++) {
            Element e = (Element) nl.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(cls)) {
                out.add(e);
            }
        }
        return out;
    }

    static String text(Document doc, String tag, String id) {
        NodeList nl = doc.getElementsByTagName(tag);
        for (int i = 0; i < nl.getLength(); i++) {
            Element e = (Element) nl.item(i);
            if (id.equals(e.getAttribute("id"))) {
                return e.getTextContent();
            }
        }
        return null;
    }

    /** Rows of the first table after the heading with {@code id}. */
    static int rowsAfter(Document doc, String id) {
        NodeList nl = doc.getElementsByTagName("h3");
        for (int i = 0; i < nl.getLength(); i++) {
            Element h = (Element) nl.item(i);
            if (id.equals(h.getAttribute("id"))) {
                org.w3c.dom.Node n = h.getNextSibling();
                while (n != null && !(n instanceof Element)) {
                    n = n.getNextSibling();
                }
                Element table = (Element) n;
                return ((Element) table.getElementsByTagName("tbody").item(0)).getElementsByTagName("tr").getLength();
            }
        }
        return -1;
    }
}
