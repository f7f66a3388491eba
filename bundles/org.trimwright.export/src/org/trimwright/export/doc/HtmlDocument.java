package org.trimwright.export.doc;

import static org.trimwright.export.text.Markup.escape;

import java.io.IOException;
import java.io.Writer;
import java.util.List;

/**
 * Writes the document as one self-contained HTML5 file: inline style, inline SVG charts, no scripts, no external
 * resources. Every piece of user or computed text goes through {@link org.trimwright.export.text.Markup#escape}.
 */
public final class HtmlDocument {

    private static final String STYLE = String.join("\n",
            "body{font-family:'DejaVu Sans','Liberation Sans',Arial,sans-serif;color:#2b3138;margin:0;"
                    + "background:#f4f5f2;line-height:1.45;font-size:14px}",
            "main{max-width:980px;margin:0 auto;background:#fff;padding:24px 48px 64px;"
                    + "box-shadow:0 0 0 1px #e1e4e0}",
            ".title{border-bottom:4px solid #1f4e79;padding:56px 0 28px;margin-bottom:24px}",
            ".title h1{font-size:34px;margin:0 0 6px;color:#1f4e79;letter-spacing:.5px}",
            ".title .kind{font-size:13px;text-transform:uppercase;letter-spacing:2px;color:#c06a2b}",
            ".title dl{display:grid;grid-template-columns:120px auto;gap:4px 12px;margin-top:22px}",
            ".title dt{color:#6b7680}",
            "h2{font-size:22px;color:#1f4e79;border-bottom:1px solid #d5dbe1;padding-bottom:4px;margin-top:40px}",
            "h3{font-size:18px;color:#1f4e79;margin-top:34px;padding-top:8px;border-top:3px solid #1f4e79}",
            "h4{font-size:14px;color:#c06a2b;margin:20px 0 6px;text-transform:uppercase;letter-spacing:1px}",
            "table{border-collapse:collapse;margin:8px 0 14px;font-size:12.5px;width:100%}",
            "caption{text-align:left;color:#6b7680;font-size:12px;padding-bottom:3px}",
            "th{background:#eef2f5;text-align:left;font-weight:600;border-bottom:1px solid #c8d0d8}",
            "td,th{padding:3px 8px;vertical-align:top}",
            "tr:nth-child(even) td{background:#fafbfa}",
            "table.kv td:first-child{width:240px;color:#5a646e}",
            ".caution{border-left:4px solid #8e3b6f;background:#f8eef4;padding:6px 12px;margin:8px 0}",
            "figure{margin:10px 0 18px}figcaption{font-size:12px;color:#6b7680}",
            "nav ol{columns:2;font-size:13px}nav li.l1{font-weight:600;margin-top:6px}",
            "svg{max-width:100%;height:auto}");

    private final Writer out;
    private int charts;

    private HtmlDocument(Writer out) {
        this.out = out;
    }

    /** Writes the whole document; {@code onSection} is told after each section (for progress). */
    public static void write(DocumentPlan plan, Writer out, Runnable onSection) throws IOException {
        write(plan, plan.sections(), out, onSection);
    }

    /**
     * Writes the whole document with the sections {@code sections} (the plan's, e.g. shared with the PDF writer
     * through {@link SharedSections}); {@code onSection} is told after each section.
     */
    public static void write(DocumentPlan plan, Iterable<Section> sections, Writer out, Runnable onSection)
            throws IOException {
        new HtmlDocument(out).document(plan, sections, onSection);
    }

    private void document(DocumentPlan plan, Iterable<Section> sections, Runnable onSection) throws IOException {
        DocumentPlan.Title t = plan.title();
        out.write("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        out.write("<meta name=\"generator\" content=\"Trimwright\">\n");
        out.write("<title>" + escape(t.chip()) + " " + escape(t.revision()) + " control specification</title>\n");
        out.write("<style>\n" + STYLE + "\n</style>\n</head>\n<body>\n<main>\n");
        out.write("<section class=\"title\" id=\"s-title\">\n<div class=\"kind\">Trim and control specification</div>\n");
        out.write("<h1>" + escape(t.chip()) + "</h1>\n<p>" + escape(t.description()) + "</p>\n<dl>");
        kv("Chip", t.chip());
        kv("Revision", t.revision());
        kv("Date", t.date());
        kv("Author", t.author());
        kv("Fields", Integer.toString(plan.digest().fields().size()));
        out.write("</dl>\n</section>\n<nav><h2>Contents</h2>\n<ol>\n");
        for (DocumentPlan.Entry e : plan.contents()) {
            out.write("<li class=\"l" + e.level() + "\"><a href=\"#" + escape(e.id()) + "\">" + escape(e.title())
                    + "</a></li>\n");
        }
        out.write("</ol>\n</nav>\n");
        for (Section s : sections) {
            section(s);
            onSection.run();
        }
        out.write("</main>\n</body>\n</html>\n");
    }

    private void kv(String k, String v) throws IOException {
        out.write("<dt>" + escape(k) + "</dt><dd>" + escape(v) + "</dd>");
    }

    private void section(Section s) throws IOException {
        String tag = "h" + (s.level() + 1);
        out.write("<section id=\"" + escape(s.id()) + "\">\n<" + tag + ">" + escape(s.title()) + "</" + tag + ">\n");
        for (Part p : s.parts()) {
            part(p);
        }
        out.write("</section>\n");
    }

    private void part(Part p) throws IOException {
        if (p instanceof Part.Para para) {
            out.write("<p>" + escape(para.text()) + "</p>\n");
        } else if (p instanceof Part.Caution c) {
            out.write("<div class=\"caution\"><strong>Caution.</strong> " + escape(c.text()) + "</div>\n");
        } else if (p instanceof Part.KeyValues kv) {
            out.write("<table class=\"kv\">\n");
            for (String[] row : kv.rows()) {
                out.write("<tr><td>" + escape(row[0]) + "</td><td>" + escape(row[1]) + "</td></tr>\n");
            }
            out.write("</table>\n");
        } else if (p instanceof Part.Table t) {
            table(t);
        } else if (p instanceof Part.Chart c) {
            charts++;
            out.write("<figure>\n");
            out.write(ChartSvg.svg(c.figure().drawn().picture(), "c" + charts + "_"));
            out.write("\n<figcaption>" + escape(c.figure().caption(c.caption())) + "</figcaption>\n</figure>\n");
        }
    }

    private void table(Part.Table t) throws IOException {
        out.write("<table>\n<caption>" + escape(t.caption()) + "</caption>\n<tr>");
        for (String h : t.header()) {
            out.write("<th>" + escape(h) + "</th>");
        }
        out.write("</tr>\n");
        for (List<String> row : t.rows()) {
            out.write("<tr>");
            for (String c : row) {
                out.write("<td>" + escape(c) + "</td>");
            }
            out.write("</tr>\n");
        }
        out.write("</table>\n");
    }
}
