package org.feedernote.report.pdf;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfDestination;
import com.lowagie.text.pdf.PdfOutline;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPRow;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfWriter;
import com.lowagie.text.pdf.draw.VerticalPositionMark;

import org.feedernote.report.pdf.LineBreaker.Run;

/**
 * Lays the note's XHTML out on OpenPDF pages, one part at a time, so a note of any length streams
 * to the file in bounded memory. It reads the markup the note's templates write (div, p, h1–h4,
 * span, b, i, sub, sup, ul/li, tables) styled by the {@link StyleSheet} subset: fonts, colours,
 * line height, alignment, margins and padding, borders and backgrounds of boxes and cells, widths,
 * inline blocks of fixed width, right floats, and the page-break properties.
 *
 * <p>Paragraphs of the flow are broken into lines here ({@link LineBreaker}) and written straight
 * onto the page's content, so their heights are exact and the page-break decisions (keep a step
 * together, a heading with what follows) rest on them. Tables and boxes are OpenPDF tables whose
 * rows this class places, page by page, repeating header rows; the paragraphs inside their cells
 * are laid out by OpenPDF.
 */
public final class Typesetter {
    private static final Set<String> INLINE = Set.of("span", "b", "strong", "i", "em", "sub", "sup", "a", "code", "br", "u");
    private static final Set<String> SKIPPED = Set.of("head", "title", "meta", "style", "script");
    /** How much of what follows a heading must fit on its page (at most). */
    private static final float KEEP_WITH_NEXT_CAP = 90f;

    private final Fonts fonts;
    private final Style.Resolver styles;
    private final Document document;
    private final PdfWriter writer;
    private final float bodyWidth;
    private final float bodyHeight;
    /** The figures templates may place, by name, and how their text reaches the PDF's fonts. */
    private final java.util.Map<String, Figure> figures;
    private final com.lowagie.text.pdf.FontMapper figureFonts;
    /** Where the next block begins on the current page (points from the page's foot). */
    private float y;
    /** Nothing placed on the current page yet: space above the first block is dropped, as at a page top. */
    private boolean pageEmpty = true;

    /** One piece of the flow, with its height. */
    private sealed interface Item permits Block, PageBreak, Group {}

    /**
     * A block and its height: in the flow a {@link Text}, {@link Rule} or {@link PdfPTable}; inside
     * a table cell an OpenPDF element.
     */
    private record Block(Object content, float height, boolean keepWithNext, String outline, String pageRef) implements Item {
        Block(Object content, float height, boolean keepWithNext, String outline) {
            this(content, height, keepWithNext, outline, null);
        }
    }

    /** The page each heading with an id began on (h2 ids). */
    private final java.util.Map<String, Integer> anchorPages = new java.util.HashMap<>();

    /** A page number printed once the page of its anchor is known: drawn into a template placed at the right margin. */
    private record PageRef(com.lowagie.text.pdf.PdfTemplate template, String anchor, BaseFont face, float size) {}

    private final List<PageRef> pageRefs = new ArrayList<>();
    /** Width kept at the right of a line that shows a page number. */
    private static final float PAGE_REF_WIDTH = 14 * Style.MM;

    private record PageBreak() implements Item {}

    /** Blocks that go on one page where they can (page-break-inside: avoid). */
    private record Group(List<Item> items, boolean keepWithNext) implements Item {}

    /** A paragraph of the flow broken into lines, {@code left} points in from the body's edge. */
    private record Text(List<LineBreaker.Line> lines, float left, float leading, float before, float after) {}

    /** A figure, {@code left} points in from the body's edge, drawn at {@code width} × {@code height}. */
    private record Picture(Figure figure, String name, float left, float width, float height, float before, float after) {}

    /** A rule under a heading: its baseline {@code leading} below the block above. */
    private record Rule(float left, float leading, float lineWidth, java.awt.Color color, float after) {}

    public Typesetter(Fonts fonts, StyleSheet sheet, Document document, PdfWriter writer) {
        this(fonts, sheet, document, writer, java.util.Map.of());
    }

    /** @param figures what {@code <div class="figure" data-figure="name"/>} in the markup names */
    public Typesetter(Fonts fonts, StyleSheet sheet, Document document, PdfWriter writer, java.util.Map<String, Figure> figures) {
        this.figures = java.util.Map.copyOf(figures);
        this.figureFonts = FigureFonts.mapper(fonts);
        this.fonts = fonts;
        this.styles = new Style.Resolver(sheet);
        this.document = document;
        this.writer = writer;
        this.bodyWidth = document.right() - document.left();
        this.bodyHeight = document.top() - document.bottom();
        this.y = document.top();
    }

    /** Style of an element under the body (for the page furniture). */
    public Style styleOf(String tag, String classes) {
        return styles.resolve(body(), List.<String[]>of(new String[] {"body", ""}), tag, classes, "");
    }

    private Style body() {
        return styles.resolve(styles.root(), List.of(), "body", "", "");
    }

    /** A part turned into blocks with their heights, ready to be placed on the pages. */
    public static final class Prepared {
        private final List<Item> items;

        private Prepared(List<Item> items) {
            this.items = items;
        }
    }

    /**
     * Turns a part into blocks. Touches neither the document nor the writer, so parts may be
     * prepared on other threads than {@link #place}, several at once (the style, font and width
     * caches are safe to share and give every thread the same answers).
     */
    public Prepared prepare(Markup.Element root) {
        List<Item> items = new ArrayList<>();
        List<String[]> ancestors = new ArrayList<>();
        Markup.Element body = root.tag().equals("body") ? root : find(root, "body");
        if (body == null) body = root;
        Style s = styles.resolve(styles.root(), ancestors, "body", body.classes(), body.style());
        ancestors.add(new String[] {"body", body.classes()});
        children(body, s, ancestors, 0, bodyWidth, true, items);
        return new Prepared(items);
    }

    /**
     * Prints the page numbers of the page references placed so far (a contents page): called once
     * every part is placed. An anchor that never appeared prints a dash.
     */
    public void finishPageReferences() {
        for (PageRef r : pageRefs) {
            Integer page = anchorPages.get(r.anchor());
            String text = page == null ? "\u2014" : page.toString();
            com.lowagie.text.pdf.PdfTemplate t = r.template();
            t.beginText();
            t.setFontAndSize(r.face(), r.size());
            t.setTextMatrix(PAGE_REF_WIDTH - r.face().getWidthPoint(text, r.size()), r.size() * 0.3f);
            t.showText(text);
            t.endText();
        }
        pageRefs.clear();
    }

    /** Places prepared blocks on the pages, in order, from the current position. */
    public void place(Prepared part) {
        flow(part.items);
    }

    private static Markup.Element find(Markup.Element e, String tag) {
        for (Object c : e.children()) {
            if (c instanceof Markup.Element child) {
                if (child.tag().equals(tag)) return child;
                Markup.Element deeper = find(child, tag);
                if (deeper != null) return deeper;
            }
        }
        return null;
    }

    // ---------------------------------------------------------------- flow on the pages

    private float remaining() {
        return y - document.bottom();
    }

    private static float height(Item item) {
        if (item instanceof Block b) return b.height();
        if (item instanceof Group g) {
            float h = 0;
            for (Item i : g.items()) h += height(i);
            return h;
        }
        return 0;
    }

    private void flow(List<Item> items) {
        for (int i = 0; i < items.size(); i++) {
            Item item = items.get(i);
            if (item instanceof PageBreak) {
                newPage();
                continue;
            }
            float needed = height(item);
            boolean keepWithNext = item instanceof Block b ? b.keepWithNext() : ((Group) item).keepWithNext();
            if (keepWithNext && i + 1 < items.size()) {
                // A heading goes with the whole of a figure, which is never split.
                Item next = items.get(i + 1);
                boolean picture = next instanceof Block nb && nb.content() instanceof Picture;
                needed += picture ? Math.min(height(next), bodyHeight - needed) : Math.min(height(next), KEEP_WITH_NEXT_CAP);
            }
            if ((item instanceof Group || keepWithNext) && needed > remaining() && needed <= bodyHeight) newPage();
            add(item);
        }
    }

    /** Ends the current page unless nothing is on it. */
    private void newPage() {
        if (pageEmpty) return;
        document.newPage();
        y = document.top();
        pageEmpty = true;
    }

    private void add(Item item) {
        if (item instanceof Group g) {
            for (Item i : g.items()) add(i);
        } else if (item instanceof Block b) {
            if (b.content() instanceof Text t) write(t, b.outline(), b.pageRef());
            else if (b.content() instanceof Rule r) write(r);
            else if (b.content() instanceof Picture p) write(p);
            else write((PdfPTable) b.content(), b.outline());
        } else {
            newPage();
        }
    }

    /**
     * A bookmark (PDF outline entry) to the current position: made once the block's space above
     * and any page break before its first line are behind, so that it lands on the block's page.
     */
    private void bookmark(String outline) {
        if (outline == null) return;
        int cut = outline.indexOf('\u0000');
        String title = cut < 0 ? outline : outline.substring(0, cut);
        if (cut >= 0) anchorPages.putIfAbsent(outline.substring(cut + 1), writer.getPageNumber());
        float top = Math.min(y + 4, document.top() + 4);
        new PdfOutline(writer.getDirectContent().getRootOutline(), new PdfDestination(PdfDestination.FITH, top), title, false);
    }

    /** Space above a block; none at the top of a page. */
    private void spaceBefore(float space) {
        if (pageEmpty || space <= 0) return;
        if (space >= remaining()) newPage();
        else y -= space;
    }

    private void spaceAfter(float space) {
        y = Math.max(document.bottom(), y - space);
    }

    /** Writes a paragraph's lines, carrying on over the page foot line by line. */
    private void write(Text t, String outline) {
        write(t, outline, null);
    }

    /** Writes a paragraph; where {@code pageRef} names an anchor, its page number goes at the right of the first line. */
    private void write(Text t, String outline, String pageRef) {
        spaceBefore(t.before());
        PdfContentByte cb = writer.getDirectContent();
        float x0 = document.left() + t.left();
        List<Underline> underlines = new ArrayList<>();
        boolean open = false;
        for (LineBreaker.Line line : t.lines()) {
            if (y - t.leading() < document.bottom() - 0.01f && !pageEmpty) {
                if (open) endText(cb, underlines);
                open = false;
                newPage();
                cb = writer.getDirectContent();
            }
            bookmark(outline);
            outline = null;
            y -= t.leading();
            pageEmpty = false;
            if (line.fragments().isEmpty()) continue;
            if (!open) {
                cb.beginText();
                open = true;
            }
            writeLine(cb, line, x0, y, underlines);
            if (pageRef != null) {
                LineBreaker.Fragment f = line.fragments().get(0);
                BaseFont face = fonts.face(f.style());
                float size = f.style().fontSize;
                com.lowagie.text.pdf.PdfTemplate template = cb.createTemplate(PAGE_REF_WIDTH, size * 1.3f);
                pageRefs.add(new PageRef(template, pageRef, face, size));
                endText(cb, underlines);
                open = false;
                cb.addTemplate(template, document.right() - PAGE_REF_WIDTH, y - size * 0.3f);
                pageRef = null;
            }
        }
        if (open) endText(cb, underlines);
        spaceAfter(t.after());
    }

    private void writeLine(PdfContentByte cb, LineBreaker.Line line, float x0, float baseline, List<Underline> underlines) {
        BaseFont face = null;
        float size = 0;
        java.awt.Color color = java.awt.Color.BLACK;
        float rise = 0;
        for (LineBreaker.Fragment f : line.fragments()) {
            Style s = f.style();
            BaseFont fFace = fonts.face(s);
            if (fFace != face || s.fontSize != size) {
                cb.setFontAndSize(fFace, s.fontSize);
                face = fFace;
                size = s.fontSize;
            }
            if (!s.color.equals(color)) {
                cb.setColorFill(s.color);
                color = s.color;
            }
            if (s.rise != rise) {
                cb.setTextRise(s.rise);
                rise = s.rise;
            }
            cb.setTextMatrix(x0 + f.x(), baseline);
            cb.showText(f.text());
            if (s.underline) {
                underlines.add(new Underline(x0 + f.x(), baseline + s.rise - s.fontSize / 3, f.width(), s.fontSize / 15, s.color));
            }
        }
        if (rise != 0) cb.setTextRise(0);
        if (!color.equals(java.awt.Color.BLACK)) cb.setColorFill(java.awt.Color.BLACK);
    }

    /** A line under a fragment: from (x, y), {@code length} long, {@code thickness} thick. */
    private record Underline(float x, float y, float length, float thickness, java.awt.Color color) {}

    /** Ends a text object and strokes the underlines of its lines (as OpenPDF's underlined fonts draw them). */
    private static void endText(PdfContentByte cb, List<Underline> underlines) {
        cb.endText();
        if (underlines.isEmpty()) return;
        cb.saveState();
        for (Underline u : underlines) {
            cb.setLineWidth(u.thickness());
            cb.setColorStroke(u.color());
            cb.moveTo(u.x(), u.y());
            cb.lineTo(u.x() + u.length(), u.y());
            cb.stroke();
        }
        cb.restoreState();
        underlines.clear();
    }

    private void write(Rule r) {
        if (y - r.leading() < document.bottom()) newPage();
        y -= r.leading();
        pageEmpty = false;
        PdfContentByte cb = writer.getDirectContent();
        cb.saveState();
        cb.setLineWidth(r.lineWidth());
        cb.setColorStroke(r.color());
        cb.moveTo(document.left() + r.left(), y);
        cb.lineTo(document.right(), y);
        cb.stroke();
        cb.restoreState();
        spaceAfter(r.after());
    }

    /**
     * Draws a figure where it fits whole: on this page, else at the top of the next; one taller
     * than a page is drawn smaller to fit (still vector, so sharp at any zoom). Drawn into a form
     * XObject through OpenPDF's Graphics2D, its text in the note's embedded fonts.
     */
    private void write(Picture p) {
        spaceBefore(p.before());
        float scale = p.height() > bodyHeight ? bodyHeight / p.height() : 1f;
        float h = p.height() * scale;
        if (h > remaining() + 0.01f) newPage();
        PdfContentByte cb = writer.getDirectContent();
        com.lowagie.text.pdf.PdfTemplate template = cb.createTemplate(p.width(), p.height());
        java.awt.Graphics2D g = template.createGraphics(p.width(), p.height(), figureFonts);
        try {
            p.figure().draw(g, p.width(), p.height());
        } finally {
            g.dispose();
        }
        cb.addTemplate(template, scale, 0, 0, scale, document.left() + p.left(), y - h);
        y -= h;
        pageEmpty = false;
        spaceAfter(p.after());
    }

    /**
     * Places a table's rows: as many whole rows as fit on each page, the header rows again at the
     * top of every page the table continues on; a row that does not fit begins the next page and
     * is split only when it is taller than a page; a table that keeps together starts a new page
     * where that page holds it whole.
     */
    private void write(PdfPTable table, String outline) {
        spaceBefore(table.spacingBefore());
        int headers = Math.min(table.getHeaderRows(), table.size());
        if (table.getKeepTogether()) {
            float total = table.getTotalHeight();
            if (total > remaining() && total <= bodyHeight) newPage();
        }
        float x = document.left();
        float repeatedHeight = 0;
        for (int r = 0; r < headers; r++) repeatedHeight += table.getRowHeight(r);
        int next = 0;
        while (next < table.size()) {
            int from = next;
            float h = 0;
            boolean continued = next > 0;
            float headerHeight = continued ? repeatedHeight : 0;
            int to = from;
            while (to < table.size() && headerHeight + h + table.getRowHeight(to) <= remaining() + 0.01f) h += table.getRowHeight(to++);
            boolean onlyHeaders = !continued && to <= headers && to < table.size();
            if ((to == from || onlyHeaders) && !pageEmpty) {
                newPage();
                continue;
            }
            if (to == from || onlyHeaders) {
                // On an empty page, a row taller than the page: what fits goes here, the rest on the
                // next page, as OpenPDF itself splits such rows.
                PdfPRow rest = table.getRow(to).splitRow(table, to, remaining() - headerHeight - h);
                if (rest != null) table.getRows().add(to + 1, rest);
                h += table.getRowHeight(to++);
            }
            PdfContentByte cb = writer.getDirectContent();
            bookmark(outline);
            outline = null;
            if (continued && headers > 0) {
                table.writeSelectedRows(0, headers, x, y, cb);
                y -= headerHeight;
            }
            table.writeSelectedRows(from, to, x, y, cb);
            y -= h;
            pageEmpty = false;
            next = to;
            if (next < table.size()) newPage();
        }
        spaceAfter(table.spacingAfter());
    }

    // ---------------------------------------------------------------- blocks

    private static boolean inline(Object node) {
        return node instanceof String || (node instanceof Markup.Element e && INLINE.contains(e.tag()));
    }

    private static boolean inlineOnly(Markup.Element e) {
        for (Object c : e.children()) if (!inline(c)) return false;
        return true;
    }

    private static List<String[]> with(List<String[]> ancestors, Markup.Element e) {
        List<String[]> out = new ArrayList<>(ancestors.size() + 1);
        out.addAll(ancestors);
        out.add(new String[] {e.tag(), e.classes()});
        return out;
    }

    /**
     * The items of a block element and its descendants, indented by {@code indent} points; in the
     * flow ({@code flow}) or for a table cell.
     */
    private void block(Markup.Element e, Style parent, List<String[]> ancestors, float indent, float width, boolean flow,
                       List<Item> out) {
        if (SKIPPED.contains(e.tag())) return;
        Style s = styles.resolve(parent, ancestors, e.tag(), e.classes(), e.style());
        if (s.hidden) return;
        if (s.breakBefore) out.add(new PageBreak());
        if (e.tag().equals("div") && e.attribute("data-figure") != null) {
            out.add(figure(e, s, indent, width, flow));
            return;
        }
        List<String[]> inner = with(ancestors, e);
        String outline = e.tag().equals("h2") ? text(e).strip() + (e.attribute("id") == null ? "" : "\u0000" + e.attribute("id")) : null;
        if (e.tag().equals("table")) {
            Measured t = table(e, s, inner, width - indent);
            PdfPTable table = t.table();
            table.setSpacingBefore(s.marginTop);
            table.setSpacingAfter(s.marginBottom);
            out.add(new Block(table, t.height() + s.marginTop + s.marginBottom, s.breakAfterAvoid, outline));
            return;
        }
        if (e.tag().equals("ul") || e.tag().equals("ol")) {
            int n = 0;
            List<Item> list = new ArrayList<>();
            for (Object c : e.children()) {
                if (!(c instanceof Markup.Element li) || !li.tag().equals("li")) continue;
                Style ls = styles.resolve(s, inner, "li", li.classes(), li.style());
                Run marker = new Run(e.tag().equals("ol") ? (++n) + "." : "•", ls);
                float hang = 4 * Style.MM;
                Measured p = paragraph(li.children(), ls, with(inner, li), indent + s.marginLeft + s.paddingLeft + hang, -hang, width,
                        marker, hang, flow);
                list.add(new Block(p.element(), p.height(), false, null));
            }
            spaceAround(list, s.marginTop == 0 ? 1.5f * Style.MM : s.marginTop, s.marginBottom == 0 ? 1.5f * Style.MM : s.marginBottom);
            out.addAll(list);
            return;
        }
        if (s.boxed() && !e.tag().equals("td") && !e.tag().equals("th")) {
            Measured box = box(e, s, inner, width - indent);
            PdfPTable table = (PdfPTable) box.element();
            table.setSpacingBefore(s.marginTop);
            table.setSpacingAfter(s.marginBottom);
            out.add(new Block(table, box.height() + s.marginTop + s.marginBottom, s.breakAfterAvoid, outline));
            return;
        }
        if (inlineOnly(e)) {
            Measured p = paragraph(e.children(), s, inner, indent + s.marginLeft + s.paddingLeft, s.textIndent, width - s.marginRight, null, 0, flow);
            if (p.element() == null) return;
            if (s.ruleWidth > 0) {
                float leading = s.paddingBottom + s.ruleWidth + 1;
                float left = indent + s.marginLeft;
                Object rule;
                if (flow) {
                    rule = new Rule(left, leading, s.ruleWidth, s.ruleColor, s.marginBottom);
                } else {
                    Paragraph line = new Paragraph();
                    line.setLeading(leading);
                    line.add(new Chunk(new com.lowagie.text.pdf.draw.LineSeparator(s.ruleWidth, 100, s.ruleColor, Element.ALIGN_LEFT, 0)));
                    line.setIndentationLeft(left);
                    line.setSpacingAfter(s.marginBottom);
                    rule = line;
                }
                out.add(new Block(spacing(p.element(), s.marginTop, 0), p.height() + s.marginTop, true, outline));
                out.add(new Block(rule, leading + s.marginBottom, s.breakAfterAvoid, null));
                return;
            }
            out.add(new Block(spacing(p.element(), s.marginTop, s.marginBottom), p.height() + s.marginTop + s.marginBottom,
                    s.breakAfterAvoid, outline, e.attribute("data-page-of")));
            return;
        }
        List<Item> mine = new ArrayList<>();
        children(e, s, inner, indent + s.marginLeft + s.paddingLeft, width, flow, mine);
        spaceAround(mine, s.marginTop, s.marginBottom);
        if (s.breakInsideAvoid) out.add(new Group(mine, s.breakAfterAvoid));
        else out.addAll(mine);
    }

    /** A figure block: {@code <div class="figure" data-figure="name"/>}, the name one of {@link #figures}. */
    private Block figure(Markup.Element e, Style s, float indent, float width, boolean flow) {
        String name = e.attribute("data-figure");
        Figure f = figures.get(name);
        if (f == null) {
            throw new IllegalArgumentException("the template places the figure \"" + name + "\", which this note does not have (it has "
                    + (figures.isEmpty() ? "none" : String.join(", ", new java.util.TreeSet<>(figures.keySet()))) + ")");
        }
        if (!flow) throw new IllegalArgumentException("the figure \"" + name + "\" is placed inside a table or box; place it in the flow");
        float left = indent + s.marginLeft;
        float w = width - left - s.marginRight;
        float h = f.height(w);
        return new Block(new Picture(f, name, left, w, h, s.marginTop, s.marginBottom), h + s.marginTop + s.marginBottom, s.breakAfterAvoid, null);
    }

    /** Children of a block: runs of inline content become anonymous paragraphs, blocks recurse. */
    private void children(Markup.Element e, Style s, List<String[]> inner, float indent, float width, boolean flow, List<Item> out) {
        List<Object> run = new ArrayList<>();
        for (Object c : e.children()) {
            if (inline(c)) {
                run.add(c);
                continue;
            }
            flushRun(run, s, inner, indent, width, flow, out);
            block((Markup.Element) c, s, inner, indent, width, flow, out);
        }
        flushRun(run, s, inner, indent, width, flow, out);
    }

    private void flushRun(List<Object> run, Style s, List<String[]> inner, float indent, float width, boolean flow, List<Item> out) {
        if (run.isEmpty()) return;
        Measured p = paragraph(List.copyOf(run), s, inner, indent, 0, width, null, 0, flow);
        run.clear();
        if (p.element() != null) out.add(new Block(p.element(), p.height(), false, null));
    }

    /** Adds a block's margins to its first and last pieces. */
    private static void spaceAround(List<Item> items, float top, float bottom) {
        if (items.isEmpty() || (top == 0 && bottom == 0)) return;
        List<Item> spaced = bump(bump(items, true, top), false, bottom);
        items.clear();
        items.addAll(spaced);
    }

    /** The items with {@code delta} added above the first block (or below the last). */
    private static List<Item> bump(List<Item> items, boolean first, float delta) {
        List<Item> out = new ArrayList<>(items);
        if (delta == 0) return out;
        for (int k = first ? 0 : out.size() - 1; k >= 0 && k < out.size(); k += first ? 1 : -1) {
            Item i = out.get(k);
            if (i instanceof Block b) {
                Object spaced = spacing(b.content(), first ? delta : 0, first ? 0 : delta);
                out.set(k, new Block(spaced, b.height() + delta, b.keepWithNext(), b.outline()));
                return out;
            }
            if (i instanceof Group g) {
                out.set(k, new Group(bump(g.items(), first, delta), g.keepWithNext()));
                return out;
            }
        }
        return out;
    }

    /** A block's content with more space above and below (OpenPDF elements are changed in place). */
    private static Object spacing(Object content, float before, float after) {
        if (content instanceof Text t) return new Text(t.lines(), t.left(), t.leading(), t.before() + before, t.after() + after);
        if (content instanceof Rule r) return new Rule(r.left(), r.leading() + before, r.lineWidth(), r.color(), r.after() + after);
        if (content instanceof Paragraph p) {
            p.setSpacingBefore(p.getSpacingBefore() + before);
            p.setSpacingAfter(p.getSpacingAfter() + after);
        } else if (content instanceof PdfPTable t) {
            t.setSpacingBefore(t.spacingBefore() + before);
            t.setSpacingAfter(t.spacingAfter() + after);
        }
        return content;
    }

    // ---------------------------------------------------------------- paragraphs

    /** An element and its estimated height. */
    private record Measured(Object element, float height) {
        PdfPTable table() {
            return (PdfPTable) element;
        }
    }


    /**
     * A paragraph of inline content: in the flow broken into lines here, for a table cell an
     * OpenPDF paragraph (with the estimate of its height a greedy break gives).
     */
    private Measured paragraph(List<Object> nodes, Style s, List<String[]> ancestors, float indentLeft, float firstIndent,
                               float width, Run marker, float markerWidth, boolean flow) {
        List<Run> runs = new ArrayList<>();
        List<Run> right = new ArrayList<>();
        List<Float> tabs = new ArrayList<>();
        inline(nodes, s, ancestors, runs, right, tabs);
        trim(runs);
        trim(right);
        if (runs.isEmpty() && right.isEmpty() && marker == null) return new Measured(null, 0);
        float lineWidth = width - indentLeft;
        if (flow) {
            // Tab stops are measured from where the first line begins: a hanging indent (a negative
            // text-indent) moves them with it.
            if (firstIndent != 0) tabs.replaceAll(t -> t + firstIndent);
            List<LineBreaker.Line> lines = LineBreaker.lines(fonts, runs, right, tabs, lineWidth, firstIndent, marker, markerWidth, s.align);
            return new Measured(new Text(lines, indentLeft, s.leading(), 0, 0), lines.size() * s.leading());
        }
        Paragraph p = new Paragraph();
        p.setFont(fonts.font(s));
        p.setLeading(s.leading());
        p.setAlignment(s.align);
        p.setIndentationLeft(indentLeft);
        p.setFirstLineIndent(firstIndent);
        float x = firstIndent;
        if (marker != null) {
            Chunk m = new Chunk(marker.text(), fonts.font(marker.style()));
            float w = fonts.width(marker.style(), marker.text());
            p.add(m);
            p.add(advance(marker.style(), Math.max(1, markerWidth - w)));
            x += markerWidth;
        }
        int t = 0;
        for (Run r : runs) {
            if (r.text() == null) {
                p.add(advance(r.style(), Math.max(1, tabs.get(t++) - x)));
                x = Math.max(x, tabs.get(t - 1));
                continue;
            }
            p.add(chunk(r));
            x += fonts.width(r.style(), r.text());
        }
        if (!right.isEmpty()) {
            p.add(new Chunk(new VerticalPositionMark()));
            for (Run r : right) if (r.text() != null) p.add(chunk(r));
        }
        // OpenPDF breaks the cell's lines itself (at hyphens too); ours is the estimate of its height.
        int lines = LineBreaker.lines(fonts, runs, right, tabs, lineWidth, firstIndent, marker, markerWidth, s.align).size();
        return new Measured(p, lines * s.leading());
    }

    /** A fixed horizontal advance: one no-break space with the character spacing that makes up the width. */
    private Chunk advance(Style s, float width) {
        Font f = fonts.font(s);
        float space = fonts.width(s, "\u00a0");
        Chunk c = new Chunk("\u00a0", f);
        c.setCharacterSpacing(Math.max(0, width - space));
        return c;
    }

    private Chunk chunk(Run r) {
        Chunk c = new Chunk(r.text(), fonts.font(r.style()));
        if (r.style().rise != 0) c.setTextRise(r.style().rise);
        return c;
    }

    /** Flattens inline content into runs; right floats go to {@code right}; inline blocks of fixed width end at a tab. */
    private void inline(List<Object> nodes, Style s, List<String[]> ancestors, List<Run> runs, List<Run> right, List<Float> tabs) {
        for (Object n : nodes) {
            if (n instanceof String text) {
                String t = fonts.printable(fonts.face(s), s.pre ? text : collapse(text));
                if (t.isEmpty()) continue;
                Run last = runs.isEmpty() ? null : runs.get(runs.size() - 1);
                // One chunk per stretch of text in one style: OpenPDF's cost is per chunk.
                if (last != null && last.text() != null && last.style() == s) runs.set(runs.size() - 1, new Run(last.text() + t, s));
                else runs.add(new Run(t, s));
                continue;
            }
            Markup.Element e = (Markup.Element) n;
            if (e.tag().equals("br")) {
                runs.add(new Run("\n", s));
                continue;
            }
            Style es = styles.resolve(s, ancestors, e.tag(), e.classes(), e.style());
            if (es.hidden) continue;
            List<String[]> inner = with(ancestors, e);
            if (es.floatRight) {
                inline(e.children(), es, inner, right, right, tabs);
                continue;
            }
            float start = width(runs, tabs);
            inline(e.children(), es, inner, runs, right, tabs);
            if (es.inlineBlock && es.width > 0) {
                tabs.add(start + es.width);
                runs.add(new Run(null, es));
            }
        }
    }

    /** The estimated width of the runs so far (tabs included). */
    private float width(List<Run> runs, List<Float> tabs) {
        float x = 0;
        int t = 0;
        for (Run r : runs) {
            if (r.text() == null) x = Math.max(x, tabs.get(t++));
            else x += fonts.width(r.style(), r.text());
        }
        return x;
    }

    private static String collapse(String text) {
        StringBuilder b = new StringBuilder(text.length());
        boolean space = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == ' ' || c == '\n' || c == '\t' || c == '\r') {
                if (!space) b.append(' ');
                space = true;
            } else {
                b.append(c);
                space = false;
            }
        }
        return b.toString();
    }

    /** Removes leading white space of the first run and trailing white space of the last, and doubled spaces between runs. */
    private static void trim(List<Run> runs) {
        while (!runs.isEmpty() && runs.get(0).text() != null && runs.get(0).text().isBlank() && !runs.get(0).style().pre) runs.remove(0);
        if (!runs.isEmpty() && runs.get(0).text() != null && !runs.get(0).style().pre) {
            runs.set(0, new Run(runs.get(0).text().stripLeading(), runs.get(0).style()));
        }
        while (!runs.isEmpty() && runs.get(runs.size() - 1).text() != null && runs.get(runs.size() - 1).text().isBlank()
                && !runs.get(runs.size() - 1).style().pre) {
            runs.remove(runs.size() - 1);
        }
        int last = runs.size() - 1;
        if (last >= 0 && runs.get(last).text() != null && !runs.get(last).style().pre) {
            runs.set(last, new Run(runs.get(last).text().stripTrailing(), runs.get(last).style()));
        }
        for (int k = 1; k < runs.size(); k++) {
            Run prev = runs.get(k - 1);
            Run cur = runs.get(k);
            if (prev.text() != null && cur.text() != null && prev.text().endsWith(" ") && cur.text().startsWith(" ")) {
                runs.set(k, new Run(cur.text().substring(1), cur.style()));
            }
        }
    }

    private static String text(Markup.Element e) {
        StringBuilder b = new StringBuilder();
        for (Object c : e.children()) {
            if (c instanceof String s) b.append(s);
            else b.append(text((Markup.Element) c));
        }
        return collapse(b.toString());
    }

    // ---------------------------------------------------------------- tables and boxes

    private Measured box(Markup.Element e, Style s, List<String[]> inner, float available) {
        float w = s.width > 0 ? Math.min(s.width, available) : s.width < 0 ? available * -s.width / 100f : available;
        PdfPTable table = new PdfPTable(1);
        table.setTotalWidth(w);
        table.setLockedWidth(true);
        table.setHorizontalAlignment(Element.ALIGN_LEFT);
        PdfPCell cell = cell(s);
        float content = w - s.paddingLeft - s.paddingRight - 2 * s.borderWidth;
        float h = fill(cell, e, s, inner, content);
        table.addCell(cell);
        table.setKeepTogether(s.breakInsideAvoid);
        return new Measured(table, Math.max(h + s.paddingTop + s.paddingBottom + 2 * s.borderWidth, s.height));
    }

    private PdfPCell cell(Style s) {
        PdfPCell cell = new PdfPCell();
        cell.setUseAscender(true);
        cell.setPaddingTop(s.paddingTop);
        cell.setPaddingRight(s.paddingRight);
        cell.setPaddingBottom(s.paddingBottom + s.fontSize * 0.25f);
        cell.setPaddingLeft(s.paddingLeft);
        if (s.borderWidth > 0) {
            cell.setBorder(Rectangle.BOX);
            cell.setBorderWidth(s.borderWidth);
            cell.setBorderColor(s.borderColor);
        } else {
            cell.setBorder(Rectangle.NO_BORDER);
        }
        if (s.background != null) cell.setBackgroundColor(s.background);
        if (s.height > 0) cell.setMinimumHeight(s.height);
        cell.setVerticalAlignment(s.verticalAlign);
        return cell;
    }

    /** Puts an element's content into a cell; returns the content's estimated height. */
    private float fill(PdfPCell cell, Markup.Element e, Style s, List<String[]> inner, float width) {
        List<Item> items = new ArrayList<>();
        if (inlineOnly(e)) {
            Measured p = paragraph(e.children(), s, inner, 0, s.textIndent, width, null, 0, false);
            if (p.element() != null) items.add(new Block(p.element(), p.height(), false, null));
        } else {
            children(e, s, inner, 0, width, false, items);
        }
        float h = 0;
        for (Item i : flatten(items)) {
            Block b = (Block) i;
            cell.addElement((Element) b.content());
            h += b.height();
        }
        return h;
    }

    private static List<Item> flatten(List<Item> items) {
        List<Item> out = new ArrayList<>();
        for (Item i : items) {
            if (i instanceof Group g) out.addAll(flatten(g.items()));
            else if (i instanceof Block) out.add(i);
        }
        return out;
    }

    private Measured table(Markup.Element e, Style s, List<String[]> inner, float available) {
        List<Markup.Element> rows = new ArrayList<>();
        List<List<String[]>> rowAncestors = new ArrayList<>();
        List<Style> rowStyles = new ArrayList<>();
        int headerRows = 0;
        for (Object c : e.children()) {
            if (!(c instanceof Markup.Element child)) continue;
            if (child.tag().equals("tr")) {
                rows.add(child);
                rowAncestors.add(inner);
                rowStyles.add(s);
            } else if (child.tag().equals("thead") || child.tag().equals("tbody") || child.tag().equals("tfoot")) {
                Style gs = styles.resolve(s, inner, child.tag(), child.classes(), child.style());
                List<String[]> groupAncestors = with(inner, child);
                for (Object r : child.children()) {
                    if (r instanceof Markup.Element tr && tr.tag().equals("tr")) {
                        rows.add(tr);
                        rowAncestors.add(groupAncestors);
                        rowStyles.add(gs);
                        if (child.tag().equals("thead")) headerRows++;
                    }
                }
            }
        }
        int columns = 1;
        for (Markup.Element tr : rows) {
            int n = 0;
            for (Object c : tr.children()) if (c instanceof Markup.Element td) n += span(td);
            columns = Math.max(columns, n);
        }
        float total = s.width > 0 ? Math.min(s.width, available) : s.width < 0 ? available * -s.width / 100f : available;
        float[] widths = new float[columns];
        if (!rows.isEmpty()) {
            Markup.Element first = rows.get(0);
            Style rs = styles.resolve(rowStyles.get(0), rowAncestors.get(0), "tr", first.classes(), first.style());
            List<String[]> ra = with(rowAncestors.get(0), first);
            int col = 0;
            for (Object c : first.children()) {
                if (!(c instanceof Markup.Element td)) continue;
                Style cs = styles.resolve(rs, ra, td.tag(), td.classes(), td.style());
                if (span(td) == 1 && col < columns) {
                    widths[col] = cs.width > 0 ? cs.width : cs.width < 0 ? total * -cs.width / 100f : 0;
                }
                col += span(td);
            }
        }
        autoWidths(widths, total, rows, rowStyles, rowAncestors);
        PdfPTable table = new PdfPTable(columns);
        table.setTotalWidth(total);
        table.setLockedWidth(true);
        table.setHorizontalAlignment(Element.ALIGN_LEFT);
        try {
            table.setWidths(widths);
        } catch (com.lowagie.text.DocumentException ex) {
            throw new IllegalStateException(ex);
        }
        table.setHeaderRows(Math.min(headerRows, rows.size()));
        table.setSplitLate(true);
        float height = 0;
        for (int r = 0; r < rows.size(); r++) {
            Markup.Element tr = rows.get(r);
            Style rs = styles.resolve(rowStyles.get(r), rowAncestors.get(r), "tr", tr.classes(), tr.style());
            List<String[]> ra = with(rowAncestors.get(r), tr);
            int col = 0;
            float rowHeight = 0;
            for (Object c : tr.children()) {
                if (!(c instanceof Markup.Element td)) continue;
                Style cs = styles.resolve(rs, ra, td.tag(), td.classes(), td.style());
                int span = Math.min(span(td), columns - col);
                float w = 0;
                for (int k = col; k < col + span; k++) w += widths[k];
                PdfPCell cell = cell(cs);
                cell.setColspan(span);
                float h = fill(cell, td, cs, with(ra, td), w - cs.paddingLeft - cs.paddingRight);
                rowHeight = Math.max(rowHeight, Math.max(cs.height, h + cs.paddingTop + cs.paddingBottom + cs.fontSize * 0.25f));
                table.addCell(cell);
                col += span;
            }
            while (col < columns) {
                PdfPCell empty = new PdfPCell();
                empty.setBorder(Rectangle.NO_BORDER);
                table.addCell(empty);
                col++;
            }
            height += rowHeight;
        }
        return new Measured(table, height);
    }

    /**
     * Columns without a given width share what is left as a browser's automatic layout would:
     * each gets its natural (unbroken) width where everything fits; otherwise at least its longest
     * word, and the rest in proportion to how much more it would take unbroken.
     */
    private void autoWidths(float[] widths, float total, List<Markup.Element> rows, List<Style> rowStyles,
                            List<List<String[]>> rowAncestors) {
        int columns = widths.length;
        float[] natural = new float[columns];
        float[] minimum = new float[columns];
        for (int r = 0; r < rows.size(); r++) {
            Markup.Element tr = rows.get(r);
            Style rs = styles.resolve(rowStyles.get(r), rowAncestors.get(r), "tr", tr.classes(), tr.style());
            List<String[]> ra = with(rowAncestors.get(r), tr);
            int col = 0;
            for (Object c : tr.children()) {
                if (!(c instanceof Markup.Element td)) continue;
                int span = span(td);
                if (span == 1 && col < columns && widths[col] == 0) {
                    Style cs = styles.resolve(rs, ra, td.tag(), td.classes(), td.style());
                    BaseFont face = fonts.face(cs);
                    String text = text(td).strip();
                    float pad = cs.paddingLeft + cs.paddingRight + 2;
                    natural[col] = Math.max(natural[col], fonts.width(face, text, cs.fontSize) + pad);
                    float longest = 0;
                    for (String word : text.split(" ")) longest = Math.max(longest, fonts.width(face, word, cs.fontSize));
                    minimum[col] = Math.max(minimum[col], longest + pad);
                }
                col += span;
            }
        }
        float given = 0;
        float naturalSum = 0;
        float minimumSum = 0;
        int open = 0;
        for (int k = 0; k < columns; k++) {
            if (widths[k] > 0) {
                given += widths[k];
            } else {
                open++;
                natural[k] = Math.max(natural[k], 6);
                minimum[k] = Math.min(Math.max(minimum[k], 6), natural[k]);
                naturalSum += natural[k];
                minimumSum += minimum[k];
            }
        }
        if (open == 0) return;
        float left = Math.max(total - given, open * 6f);
        for (int k = 0; k < columns; k++) {
            if (widths[k] > 0) continue;
            if (naturalSum <= left) {
                widths[k] = natural[k] + (left - naturalSum) * natural[k] / naturalSum;
            } else if (minimumSum <= left) {
                float flexible = naturalSum - minimumSum;
                widths[k] = minimum[k] + (flexible <= 0 ? 0 : (left - minimumSum) * (natural[k] - minimum[k]) / flexible);
            } else {
                widths[k] = left * minimum[k] / minimumSum;
            }
        }
    }

    private static int span(Markup.Element td) {
        String v = td.attribute("colspan");
        if (v == null) return 1;
        try {
            return Math.max(1, Integer.parseInt(v.trim()));
        } catch (NumberFormatException e) {
            return 1;
        }
    }
}
