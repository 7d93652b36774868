package org.feedernote.sheet;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.Deflater;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

/**
 * Writes tables as an .xlsx workbook: typed cells, a frozen header, a filter, validation lists,
 * comments on the headers, and the failing rows marked. The parts are SpreadsheetML written by our
 * own code straight into the zip, row by row (ECMA-376 5th edition Part 1 / ISO/IEC 29500-1:2016:
 * §18.3 worksheets, §18.8 styles, §18.7 comments, §18.2 the workbook; Part 2 / ISO/IEC 29500-2,
 * the package: [Content_Types].xml and the relationship parts; a comment's box is the legacy VML
 * shape, Part 4 / ISO/IEC 29500-4 §19). POI built an object model per sheet and a temporary file
 * per sheet, and loaded about 1 100 classes to do it: for 10 000 circuits on 252 sheets the write
 * took longer than the check (bench/SHEETS.md). POI still reads workbooks (input/WorkbookGrid).
 * The same tables give the same bytes: the document's date is given, every zip entry's time fixed.
 */
public final class XlsxWriter {
    private XlsxWriter() {}

    /** Zip entries' time: the bytes must not depend on the clock. */
    private static final LocalDateTime ENTRY_TIME = LocalDateTime.of(2000, 1, 1, 0, 0);

    /** Excel refuses an explicit validation list longer than this (its formula's limit). */
    private static final int LIST_LIMIT = 255;

    /** Fastest deflate: for 10 000 circuits (23 MB of XML) zlib took 0.14 s at level 1, 0.34 s at the default 6, for 4.5 MB against 3.7. */
    private static final int LEVEL = Deflater.BEST_SPEED;

    private static final String MAIN = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";
    private static final String REL = "http://schemas.openxmlformats.org/officeDocument/2006/relationships";
    private static final String PKG_REL = "http://schemas.openxmlformats.org/package/2006/relationships";
    private static final String XML_HEAD = "<?xml version=\"1.0\" encoding=\"UTF-8\" standalone=\"yes\"?>\n";

    /** date: the document's creation date, YYYY-MM-DD (the project's, so that the clock is never read). */
    public static void write(List<Table> tables, String date, OutputStream out) throws IOException {
        java.time.LocalDate.parse(date); // refuses a malformed date before anything is written
        ZipOutputStream zip = new ZipOutputStream(new BufferedOutputStream(out, 1 << 16));
        zip.setLevel(LEVEL);
        Xml x = new Xml(zip);
        Styles styles = new Styles();
        boolean[] commented = new boolean[tables.size()];
        for (int s = 0; s < tables.size(); s++) {
            Table t = tables.get(s);
            for (Table.Column c : t.columns()) if (c.comment() != null && !c.comment().isEmpty()) commented[s] = true;
        }
        packageParts(x, tables, commented, date);
        workbook(x, tables);
        for (int s = 0; s < tables.size(); s++) {
            x.begin("xl/worksheets/sheet" + (s + 1) + ".xml");
            sheet(x, tables.get(s), s == 0, commented[s], styles);
            x.end();
            if (commented[s]) comments(x, tables.get(s), s + 1);
        }
        styles(x, styles); // last: a cell format is added when a sheet first needs it
        zip.finish();
        zip.flush();
    }

    // ---- worksheets (ECMA-376 Part 1 §18.3.1) ----

    private static void sheet(Xml x, Table t, boolean selected, boolean commented, Styles styles) throws IOException {
        int n = t.columns().size();
        String[] col = new String[n];
        for (int i = 0; i < n; i++) col[i] = column(i);
        int first = t.keyed() ? 2 : 1;
        int rows = first + t.rows().size();
        int last = Math.max(rows - 1, first + t.validatedRows() - 1);
        x.raw(XML_HEAD).raw("<worksheet xmlns=\"").raw(MAIN).raw('"');
        if (commented) x.raw(" xmlns:r=\"").raw(REL).raw('"');
        x.raw("><dimension ref=\"A1:").raw(col[n - 1]).num(rows).raw("\"/><sheetViews><sheetView workbookViewId=\"0\"");
        if (selected) x.raw(" tabSelected=\"1\"");
        x.raw('>');
        boolean keyColumn = t.columns().get(0).heading().equals("key");
        String pane = keyColumn ? "bottomRight" : "bottomLeft";
        x.raw("<pane");
        if (keyColumn) x.raw(" xSplit=\"1\"");
        x.raw(" ySplit=\"").num(first).raw("\" topLeftCell=\"").raw(keyColumn ? "B" : "A").num(first + 1)
                .raw("\" activePane=\"").raw(pane).raw("\" state=\"frozen\"/><selection pane=\"").raw(pane)
                .raw("\"/></sheetView></sheetViews><sheetFormatPr defaultRowHeight=\"15\"/><cols>");
        for (int i = 0; i < n; i++) {
            x.raw("<col min=\"").num(i + 1).raw("\" max=\"").num(i + 1).raw("\" width=\"")
                    .num(Math.min(60, Math.max(10, t.heading(i).length() + 2))).raw("\" customWidth=\"1\"/>");
        }
        x.raw("</cols><sheetData>");
        x.raw("<row r=\"1\">");
        for (int i = 0; i < n; i++) text(x, col[i], 1, Styles.HEADER, t.heading(i));
        x.raw("</row>");
        if (t.keyed()) {
            x.raw("<row r=\"2\">");
            for (int i = 0; i < n; i++) {
                String unit = t.columns().get(i).unit();
                if (unit != null) text(x, col[i], 2, Styles.UNITS, "(" + unit + ")");
            }
            x.raw("</row>");
        }
        // Per column, fill and whether the value is a number: the style, looked up once.
        int[] styleAt = new int[n * 6];
        java.util.Arrays.fill(styleAt, -1);
        List<String> validations = new ArrayList<>();
        int r = first + 1;
        for (Table.Row row : t.rows()) {
            x.raw("<row r=\"").num(r).raw("\">");
            List<Object> cells = row.cells();
            for (int i = 0; i < cells.size() && i < n; i++) {
                Object v = cells.get(i);
                if (v == null) continue;
                int fill = i == row.markedColumn() ? 2 : row.failing() ? 1 : 0;
                boolean number = v instanceof Number;
                int slot = (i * 3 + fill) * 2 + (number ? 1 : 0);
                int style = styleAt[slot];
                if (style < 0) {
                    style = styles.of(number ? t.columns().get(i).format() : null, fill);
                    styleAt[slot] = style;
                }
                if (number) {
                    x.raw("<c r=\"").raw(col[i]).num(r).raw('"');
                    if (style != 0) x.raw(" s=\"").num(style).raw('"');
                    x.raw("><v>").raw(Double.toString(((Number) v).doubleValue())).raw("</v></c>");
                } else if (v instanceof Boolean b) {
                    x.raw("<c r=\"").raw(col[i]).num(r).raw('"');
                    if (style != 0) x.raw(" s=\"").num(style).raw('"');
                    x.raw(" t=\"b\"><v>").raw(b ? "1" : "0").raw("</v></c>");
                } else {
                    text(x, col[i], r, style, v.toString());
                }
            }
            x.raw("</row>");
            if (!row.choices().isEmpty()) validation(validations, row.choices(), "B" + r);
            r++;
        }
        x.raw("</sheetData>");
        x.raw("<autoFilter ref=\"A").num(first).raw(':').raw(col[n - 1]).num(rows).raw("\"/>");
        if (last >= first) {
            for (int i = 0; i < n; i++) {
                List<String> choices = t.columns().get(i).choices();
                if (!choices.isEmpty()) validation(validations, choices, col[i] + (first + 1) + ":" + col[i] + (last + 1));
            }
        }
        if (!validations.isEmpty()) {
            x.raw("<dataValidations count=\"").num(validations.size()).raw("\">");
            for (String v : validations) x.raw(v);
            x.raw("</dataValidations>");
        }
        x.raw("<pageMargins left=\"0.7\" right=\"0.7\" top=\"0.75\" bottom=\"0.75\" header=\"0.3\" footer=\"0.3\"/>");
        if (commented) x.raw("<legacyDrawing r:id=\"rId1\"/>");
        x.raw("</worksheet>");
    }

    /** An inline string cell (§18.3.1.53): no shared-string table to hold in memory. */
    private static void text(Xml x, String col, int row, int style, String s) throws IOException {
        x.raw("<c r=\"").raw(col).num(row).raw('"');
        if (style != 0) x.raw(" s=\"").num(style).raw('"');
        x.raw(" t=\"inlineStr\"><is><t");
        if (!s.isEmpty() && (Character.isWhitespace(s.charAt(0)) || Character.isWhitespace(s.charAt(s.length() - 1)))) {
            x.raw(" xml:space=\"preserve\"");
        }
        x.raw('>').text(s).raw("</t></is></c>");
    }

    /** A list validation (§18.3.1.32) over sqref, with a stop box naming the choices; none where Excel's formula limit is passed. */
    private static void validation(List<String> out, List<String> choices, String sqref) {
        String list = String.join(",", choices);
        if (list.length() > LIST_LIMIT) return;
        out.add("<dataValidation type=\"list\" errorStyle=\"stop\" allowBlank=\"1\" showErrorMessage=\"1\" errorTitle=\"Not allowed\" error=\""
                + Xml.escape("Choose one of: " + String.join(", ", choices)) + "\" sqref=\"" + sqref + "\"><formula1>"
                + Xml.escape("\"" + list + "\"") + "</formula1></dataValidation>");
    }

    /** The column's letters: 0 → A, 25 → Z, 26 → AA. */
    static String column(int index) {
        StringBuilder b = new StringBuilder();
        for (int i = index + 1; i > 0; i = (i - 1) / 26) b.insert(0, (char) ('A' + (i - 1) % 26));
        return b.toString();
    }

    // ---- comments (§18.7) and their boxes (legacy VML, Part 4 §19) ----

    private static void comments(Xml x, Table t, int sheet) throws IOException {
        x.begin("xl/comments" + sheet + ".xml");
        x.raw(XML_HEAD).raw("<comments xmlns=\"").raw(MAIN).raw("\"><authors><author>feedernote</author></authors><commentList>");
        List<Integer> at = new ArrayList<>();
        for (int i = 0; i < t.columns().size(); i++) {
            String c = t.columns().get(i).comment();
            if (c == null || c.isEmpty()) continue;
            at.add(i);
            x.raw("<comment ref=\"").raw(column(i)).raw("1\" authorId=\"0\"><text><t xml:space=\"preserve\">").text(c).raw("</t></text></comment>");
        }
        x.raw("</commentList></comments>");
        x.end();
        x.begin("xl/drawings/vmlDrawing" + sheet + ".vml");
        x.raw("<xml xmlns:v=\"urn:schemas-microsoft-com:vml\" xmlns:o=\"urn:schemas-microsoft-com:office:office\""
                + " xmlns:x=\"urn:schemas-microsoft-com:office:excel\"><o:shapelayout v:ext=\"edit\"><o:idmap v:ext=\"edit\" data=\"")
                .num(sheet).raw("\"/></o:shapelayout><v:shapetype id=\"_x0000_t202\" coordsize=\"21600,21600\" o:spt=\"202\""
                + " path=\"m,l,21600r21600,l21600,xe\"><v:stroke joinstyle=\"miter\"/><v:path gradientshapeok=\"t\" o:connecttype=\"rect\"/></v:shapetype>");
        int id = sheet * 1024 + 1;
        for (int i : at) {
            // The box: hidden until the cell is pointed at, four columns wide and six rows high.
            x.raw("<v:shape id=\"_x0000_s").num(id++).raw("\" type=\"#_x0000_t202\" style=\"position:absolute;visibility:hidden\""
                    + " fillcolor=\"#ffffe1\" o:insetmode=\"auto\"><v:fill color=\"#ffffe1\"/><v:shadow on=\"t\" color=\"black\" obscured=\"t\"/>"
                    + "<v:path o:connecttype=\"none\"/><v:textbox style=\"mso-direction-alt:auto\"/><x:ClientData ObjectType=\"Note\">"
                    + "<x:MoveWithCells/><x:SizeWithCells/><x:Anchor>").num(i).raw(", 0, 0, 0, ").num(i + 4).raw(", 0, 6, 0</x:Anchor>"
                    + "<x:AutoFill>False</x:AutoFill><x:Row>0</x:Row><x:Column>").num(i).raw("</x:Column></x:ClientData></v:shape>");
        }
        x.raw("</xml>");
        x.end();
        x.begin("xl/worksheets/_rels/sheet" + sheet + ".xml.rels");
        x.raw(XML_HEAD).raw("<Relationships xmlns=\"").raw(PKG_REL).raw("\">")
                .raw("<Relationship Id=\"rId1\" Type=\"").raw(REL).raw("/vmlDrawing\" Target=\"../drawings/vmlDrawing").num(sheet).raw(".vml\"/>")
                .raw("<Relationship Id=\"rId2\" Type=\"").raw(REL).raw("/comments\" Target=\"../comments").num(sheet).raw(".xml\"/>")
                .raw("</Relationships>");
        x.end();
    }

    // ---- styles (§18.8) ----

    /**
     * The cell formats, in the order first asked for: 0 the default, 1 the header (bold, wrapped,
     * a thin rule below), 2 the units (grey italic, the rule), then a number format and a fill per
     * combination used. Fills: 0 and 1 the two the format reserves (none, gray125), then a solid
     * fill per colour used.
     */
    private static final class Styles {
        static final int HEADER = 1;
        static final int UNITS = 2;
        /** Indexed colours (§18.8.27): 45 rose for a failing row, 43 light yellow for the governing check. */
        static final int[] FILL_COLOUR = {0, 45, 43};
        static final Map<String, Integer> BUILT_IN = Map.of("General", 0, "0", 1, "0.00", 2, "#,##0", 3, "#,##0.00", 4, "0%", 9, "0.00%", 10);

        final List<String> formats = new ArrayList<>();
        final List<Integer> fills = new ArrayList<>();
        /** Per cell format from 3: number format id, fill id. */
        final List<int[]> xfs = new ArrayList<>();
        final Map<String, Integer> cache = new HashMap<>();

        /** fill: 0 none, 1 failing row, 2 the governing check. */
        int of(String format, int fill) {
            if (format == null && fill == 0) return 0;
            String key = format + "|" + fill;
            Integer s = cache.get(key);
            if (s != null) return s;
            int numFmt = 0;
            if (format != null) {
                Integer builtIn = BUILT_IN.get(format);
                if (builtIn != null) numFmt = builtIn;
                else {
                    int k = formats.indexOf(format);
                    if (k < 0) {
                        formats.add(format);
                        k = formats.size() - 1;
                    }
                    numFmt = 164 + k;
                }
            }
            int fillId = 0;
            if (fill != 0) {
                int k = fills.indexOf(FILL_COLOUR[fill]);
                if (k < 0) {
                    fills.add(FILL_COLOUR[fill]);
                    k = fills.size() - 1;
                }
                fillId = 2 + k;
            }
            xfs.add(new int[] {numFmt, fillId});
            s = 2 + xfs.size();
            cache.put(key, s);
            return s;
        }
    }

    private static void styles(Xml x, Styles s) throws IOException {
        x.begin("xl/styles.xml");
        x.raw(XML_HEAD).raw("<styleSheet xmlns=\"").raw(MAIN).raw("\">");
        if (!s.formats.isEmpty()) {
            x.raw("<numFmts count=\"").num(s.formats.size()).raw("\">");
            for (int i = 0; i < s.formats.size(); i++) {
                x.raw("<numFmt numFmtId=\"").num(164 + i).raw("\" formatCode=\"").text(s.formats.get(i)).raw("\"/>");
            }
            x.raw("</numFmts>");
        }
        x.raw("<fonts count=\"3\"><font><sz val=\"11\"/><color indexed=\"8\"/><name val=\"Calibri\"/><family val=\"2\"/><scheme val=\"minor\"/></font>"
                + "<font><b/><sz val=\"11\"/><name val=\"Calibri\"/></font>"
                + "<font><i/><sz val=\"11\"/><color indexed=\"23\"/><name val=\"Calibri\"/></font></fonts>");
        x.raw("<fills count=\"").num(2 + s.fills.size()).raw("\"><fill><patternFill patternType=\"none\"/></fill><fill><patternFill patternType=\"gray125\"/></fill>");
        for (int colour : s.fills) x.raw("<fill><patternFill patternType=\"solid\"><fgColor indexed=\"").num(colour).raw("\"/></patternFill></fill>");
        x.raw("</fills><borders count=\"2\"><border><left/><right/><top/><bottom/><diagonal/></border>"
                + "<border><left/><right/><top/><bottom style=\"thin\"/><diagonal/></border></borders>"
                + "<cellStyleXfs count=\"1\"><xf numFmtId=\"0\" fontId=\"0\" fillId=\"0\" borderId=\"0\"/></cellStyleXfs>");
        x.raw("<cellXfs count=\"").num(3 + s.xfs.size()).raw("\"><xf numFmtId=\"0\" fontId=\"0\" fillId=\"0\" borderId=\"0\" xfId=\"0\"/>"
                + "<xf numFmtId=\"0\" fontId=\"1\" fillId=\"0\" borderId=\"1\" xfId=\"0\" applyFont=\"1\" applyBorder=\"1\" applyAlignment=\"1\"><alignment wrapText=\"1\"/></xf>"
                + "<xf numFmtId=\"0\" fontId=\"2\" fillId=\"0\" borderId=\"1\" xfId=\"0\" applyFont=\"1\" applyBorder=\"1\"/>");
        for (int[] xf : s.xfs) {
            x.raw("<xf numFmtId=\"").num(xf[0]).raw("\" fontId=\"0\" fillId=\"").num(xf[1]).raw("\" borderId=\"0\" xfId=\"0\"");
            if (xf[0] != 0) x.raw(" applyNumberFormat=\"1\"");
            if (xf[1] != 0) x.raw(" applyFill=\"1\"");
            x.raw("/>");
        }
        x.raw("</cellXfs><cellStyles count=\"1\"><cellStyle name=\"Normal\" xfId=\"0\" builtinId=\"0\"/></cellStyles></styleSheet>");
        x.end();
    }

    // ---- the workbook (§18.2) and the package (Part 2) ----

    private static void workbook(Xml x, List<Table> tables) throws IOException {
        x.begin("xl/workbook.xml");
        x.raw(XML_HEAD).raw("<workbook xmlns=\"").raw(MAIN).raw("\" xmlns:r=\"").raw(REL).raw("\"><bookViews><workbookView activeTab=\"0\"/></bookViews><sheets>");
        for (int s = 0; s < tables.size(); s++) {
            x.raw("<sheet name=\"").text(tables.get(s).name()).raw("\" sheetId=\"").num(s + 1).raw("\" r:id=\"rId").num(s + 1).raw("\"/>");
        }
        x.raw("</sheets><definedNames>");
        for (int s = 0; s < tables.size(); s++) {
            // The filter's range, as Excel itself names it (§18.2.5): a filter without it shows no buttons in some programs.
            Table t = tables.get(s);
            int first = t.keyed() ? 2 : 1;
            int lastRow = Math.max(first, first + t.rows().size());
            String last = column(t.columns().size() - 1);
            x.raw("<definedName name=\"_xlnm._FilterDatabase\" localSheetId=\"").num(s).raw("\" hidden=\"1\">")
                    .text(sheetReference(t.name())).raw("!$A$").num(first).raw(":$").raw(last).raw("$").num(lastRow).raw("</definedName>");
        }
        x.raw("</definedNames></workbook>");
        x.end();
        x.begin("xl/_rels/workbook.xml.rels");
        x.raw(XML_HEAD).raw("<Relationships xmlns=\"").raw(PKG_REL).raw("\">");
        for (int s = 0; s < tables.size(); s++) {
            x.raw("<Relationship Id=\"rId").num(s + 1).raw("\" Type=\"").raw(REL).raw("/worksheet\" Target=\"worksheets/sheet").num(s + 1).raw(".xml\"/>");
        }
        int id = tables.size() + 1;
        x.raw("<Relationship Id=\"rId").num(id).raw("\" Type=\"").raw(REL).raw("/styles\" Target=\"styles.xml\"/></Relationships>");
        x.end();
    }

    /** A sheet's name as a formula refers to it: quoted unless it is a plain word that cannot be read as a cell. */
    static String sheetReference(String name) {
        if (name.matches("[A-Za-z_][A-Za-z0-9_.]*") && !name.matches("(?i)[a-z]{1,3}[0-9]+|r[0-9]*c[0-9]*|true|false")) return name;
        return "'" + name.replace("'", "''") + "'";
    }

    private static void packageParts(Xml x, List<Table> tables, boolean[] commented, String date) throws IOException {
        x.begin("docProps/core.xml");
        x.raw(XML_HEAD).raw("<cp:coreProperties xmlns:cp=\"http://schemas.openxmlformats.org/package/2006/metadata/core-properties\""
                + " xmlns:dc=\"http://purl.org/dc/elements/1.1/\" xmlns:dcterms=\"http://purl.org/dc/terms/\""
                + " xmlns:xsi=\"http://www.w3.org/2001/XMLSchema-instance\"><dcterms:created xsi:type=\"dcterms:W3CDTF\">")
                .raw(date).raw("T00:00:00Z</dcterms:created><dc:creator>feedernote</dc:creator></cp:coreProperties>");
        x.end();
        x.begin("docProps/app.xml");
        x.raw(XML_HEAD).raw("<Properties xmlns=\"http://schemas.openxmlformats.org/officeDocument/2006/extended-properties\"><Application>feedernote</Application></Properties>");
        x.end();
        x.begin("_rels/.rels");
        x.raw(XML_HEAD).raw("<Relationships xmlns=\"").raw(PKG_REL).raw("\">")
                .raw("<Relationship Id=\"rId1\" Type=\"").raw(REL).raw("/officeDocument\" Target=\"xl/workbook.xml\"/>")
                .raw("<Relationship Id=\"rId2\" Type=\"").raw(REL).raw("/extended-properties\" Target=\"docProps/app.xml\"/>")
                .raw("<Relationship Id=\"rId3\" Type=\"http://schemas.openxmlformats.org/package/2006/relationships/metadata/core-properties\" Target=\"docProps/core.xml\"/>")
                .raw("</Relationships>");
        x.end();
        String ct = "application/vnd.openxmlformats-officedocument.";
        x.begin("[Content_Types].xml");
        x.raw(XML_HEAD).raw("<Types xmlns=\"http://schemas.openxmlformats.org/package/2006/content-types\">"
                + "<Default Extension=\"rels\" ContentType=\"application/vnd.openxmlformats-package.relationships+xml\"/>"
                + "<Default Extension=\"xml\" ContentType=\"application/xml\"/>"
                + "<Default Extension=\"vml\" ContentType=\"" + ct + "vmlDrawing\"/>"
                + "<Override PartName=\"/xl/workbook.xml\" ContentType=\"" + ct + "spreadsheetml.sheet.main+xml\"/>"
                + "<Override PartName=\"/xl/styles.xml\" ContentType=\"" + ct + "spreadsheetml.styles+xml\"/>"
                + "<Override PartName=\"/docProps/core.xml\" ContentType=\"application/vnd.openxmlformats-package.core-properties+xml\"/>"
                + "<Override PartName=\"/docProps/app.xml\" ContentType=\"" + ct + "extended-properties+xml\"/>");
        for (int s = 0; s < tables.size(); s++) {
            x.raw("<Override PartName=\"/xl/worksheets/sheet").num(s + 1).raw(".xml\" ContentType=\"").raw(ct).raw("spreadsheetml.worksheet+xml\"/>");
            if (commented[s]) x.raw("<Override PartName=\"/xl/comments").num(s + 1).raw(".xml\" ContentType=\"").raw(ct).raw("spreadsheetml.comments+xml\"/>");
        }
        x.raw("</Types>");
        x.end();
    }

    /**
     * The XML of one part at a time, encoded as UTF-8 into a buffer and deflated into the zip entry.
     * Text is escaped here; raw() takes markup the writer made itself.
     */
    static final class Xml {
        private final ZipOutputStream zip;
        private final byte[] buf = new byte[1 << 16];
        private int at;

        Xml(ZipOutputStream zip) {
            this.zip = zip;
        }

        void begin(String name) throws IOException {
            ZipEntry e = new ZipEntry(name);
            e.setTimeLocal(ENTRY_TIME);
            zip.putNextEntry(e);
        }

        void end() throws IOException {
            flush();
            zip.closeEntry();
        }

        private void flush() throws IOException {
            zip.write(buf, 0, at);
            at = 0;
        }

        private void room(int n) throws IOException {
            if (at + n > buf.length) flush();
        }

        Xml raw(char c) throws IOException {
            room(1);
            buf[at++] = (byte) c;
            return this;
        }

        /** Markup of our own: ASCII, or text already escaped. */
        Xml raw(String s) throws IOException {
            int n = s.length();
            for (int i = 0; i < n; i++) {
                char c = s.charAt(i);
                if (c >= 0x80) return encode(s, i);
                if (at == buf.length) flush();
                buf[at++] = (byte) c;
            }
            return this;
        }

        Xml num(int v) throws IOException {
            if (v < 0) {
                raw('-');
                v = -v;
            }
            room(11);
            int start = at;
            do {
                buf[at++] = (byte) ('0' + v % 10);
                v /= 10;
            } while (v > 0);
            for (int i = start, j = at - 1; i < j; i++, j--) {
                byte t = buf[i];
                buf[i] = buf[j];
                buf[j] = t;
            }
            return this;
        }

        /** Character data or an attribute's value, escaped; characters XML 1.0 cannot carry become '?'. */
        Xml text(String s) throws IOException {
            int n = s.length();
            for (int i = 0; i < n; i++) {
                char c = s.charAt(i);
                switch (c) {
                    case '&': raw("&amp;"); break;
                    case '<': raw("&lt;"); break;
                    case '>': raw("&gt;"); break;
                    case '"': raw("&quot;"); break;
                    case '\n': raw("&#10;"); break;
                    case '\r': raw("&#13;"); break;
                    case '\t': raw("&#9;"); break;
                    default:
                        if (c < 0x20 || c == 0xFFFE || c == 0xFFFF) raw('?');
                        else if (c < 0x80) raw(c);
                        else if (Character.isHighSurrogate(c) && i + 1 < n && Character.isLowSurrogate(s.charAt(i + 1))) {
                            utf8(Character.toCodePoint(c, s.charAt(++i)));
                        } else if (Character.isSurrogate(c)) raw('?');
                        else utf8(c);
                }
            }
            return this;
        }

        private Xml encode(String s, int from) throws IOException {
            int n = s.length();
            for (int i = from; i < n; i++) {
                char c = s.charAt(i);
                if (Character.isHighSurrogate(c) && i + 1 < n) utf8(Character.toCodePoint(c, s.charAt(++i)));
                else utf8(c);
            }
            return this;
        }

        private void utf8(int cp) throws IOException {
            room(4);
            if (cp < 0x80) buf[at++] = (byte) cp;
            else if (cp < 0x800) {
                buf[at++] = (byte) (0xC0 | cp >> 6);
                buf[at++] = (byte) (0x80 | cp & 0x3F);
            } else if (cp < 0x10000) {
                buf[at++] = (byte) (0xE0 | cp >> 12);
                buf[at++] = (byte) (0x80 | cp >> 6 & 0x3F);
                buf[at++] = (byte) (0x80 | cp & 0x3F);
            } else {
                buf[at++] = (byte) (0xF0 | cp >> 18);
                buf[at++] = (byte) (0x80 | cp >> 12 & 0x3F);
                buf[at++] = (byte) (0x80 | cp >> 6 & 0x3F);
                buf[at++] = (byte) (0x80 | cp & 0x3F);
            }
        }

        static String escape(String s) {
            return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
        }
    }
}
