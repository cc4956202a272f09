package org.thermion.plot;

import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a picture back with the JDK's XML parser: per curve (by its legend name) the points its
 * polylines pass through, mapped from pixels to values through its panel's plot area and axis
 * ranges. A test compares them with the CSV of the same run.
 */
public final class SvgPoints {
    private SvgPoints() {
    }

    /** A curve's points in data units; {@code steps} vertices included as drawn. */
    public record Curve(String name, List<double[]> points, double xRange, double yRange) {
    }

    /** Every curve of the document, by legend name (curves split at gaps are joined in order). */
    public static Map<String, Curve> read(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        Element root = doc.getDocumentElement();
        if (!root.getTagName().equals("svg") || !"http://www.w3.org/2000/svg".equals(root.getAttribute("xmlns"))) {
            throw new IllegalStateException("not an SVG document: " + root.getTagName());
        }
        Map<String, Curve> out = new LinkedHashMap<>();
        NodeList groups = root.getElementsByTagName("g");
        for (int g = 0; g < groups.getLength(); g++) {
            Element panel = (Element) groups.item(g);
            if (!panel.getAttribute("class").equals("panel")) {
                continue;
            }
            double xmin = d(panel, "data-xmin"), xmax = d(panel, "data-xmax"), ymin = d(panel, "data-ymin"),
                    ymax = d(panel, "data-ymax");
            Element area = null;
            NodeList rects = panel.getElementsByTagName("rect");
            for (int i = 0; i < rects.getLength(); i++) {
                Element r = (Element) rects.item(i);
                if (r.getAttribute("class").equals("plot-area")) {
                    area = r;
                }
            }
            if (area == null) {
                throw new IllegalStateException("a panel without a plot area");
            }
            double x0 = d(area, "x"), y0 = d(area, "y"), w = d(area, "width"), h = d(area, "height");
            NodeList lines = panel.getElementsByTagName("polyline");
            for (int i = 0; i < lines.getLength(); i++) {
                Element p = (Element) lines.item(i);
                String name = p.getAttribute("data-name");
                Curve c = out.computeIfAbsent(name, k -> new Curve(k, new ArrayList<>(), xmax - xmin, ymax - ymin));
                for (String pair : p.getAttribute("points").trim().split("\\s+")) {
                    String[] xy = pair.split(",");
                    double px = Double.parseDouble(xy[0]), py = Double.parseDouble(xy[1]);
                    c.points().add(new double[] {xmin + (px - x0) / w * (xmax - xmin), ymin + (y0 + h - py) / h * (ymax - ymin)});
                }
            }
        }
        return out;
    }

    /** The text of every element of class {@code cls}, in document order. */
    public static List<String> texts(String svg, String cls) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        NodeList all = doc.getElementsByTagName("*");
        List<String> t = new ArrayList<>();
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (e.getAttribute("class").equals(cls)) {
                t.add(e.getTextContent());
            }
        }
        return t;
    }

    private static double d(Element e, String attr) {
        return Double.parseDouble(e.getAttribute(attr));
    }
}
