package org.feedernote.input;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import javax.xml.parsers.ParserConfigurationException;

import org.apache.poi.openxml4j.exceptions.InvalidFormatException;
import org.apache.poi.openxml4j.exceptions.OpenXML4JException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.ReadOnlySharedStringsTable;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.model.StylesTable;
import org.apache.poi.xssf.usermodel.XSSFCellStyle;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * The cells of an .xlsx workbook's sheets, read as a stream of XML (POI's event API): each cell
 * with its type as stored (number, text, true/false, a number shown as a date). The workbook is
 * never built as objects, so 10 000 circuits read in a fraction of their check (bench/SHEETS.md).
 */
final class WorkbookGrid {
    private WorkbookGrid() {}

    static {
        PoiLogging.quiet();
    }

    /** Puts each wanted sheet (matched without regard to case) into grids, under its wanted name. */
    static void read(Path file, List<String> wanted, Map<String, SheetInput.Grid> grids) throws IOException {
        try (OPCPackage pkg = OPCPackage.open(file.toFile(), PackageAccess.READ)) {
            XSSFReader reader = new XSSFReader(pkg);
            ReadOnlySharedStringsTable strings = new ReadOnlySharedStringsTable(pkg, false);
            StylesTable styles = reader.getStylesTable();
            XSSFReader.SheetIterator sheets = (XSSFReader.SheetIterator) reader.getSheetsData();
            while (sheets.hasNext()) {
                try (InputStream in = sheets.next()) {
                    String name = sheets.getSheetName();
                    String key = null;
                    for (String w : wanted) if (w.equalsIgnoreCase(name.strip())) key = w;
                    if (key == null || grids.containsKey(key)) continue;
                    List<List<SheetInput.Cell>> rows = new ArrayList<>();
                    XMLReader xml = XMLHelper.newXMLReader();
                    xml.setContentHandler(new Handler(strings, styles, rows));
                    xml.parse(new InputSource(in));
                    grids.put(key, new SheetInput.Grid(name, rows));
                }
            }
        } catch (InvalidFormatException e) {
            throw new IOException("not an .xlsx workbook (" + e.getMessage() + ")", e);
        } catch (OpenXML4JException | SAXException | ParserConfigurationException e) {
            throw new IOException(e.getMessage(), e);
        } catch (org.apache.poi.UnsupportedFileFormatException e) {
            throw new IOException("not an .xlsx workbook (" + e.getMessage() + ")", e);
        }
    }

    /** The sheet XML: rows of <c r="F12" t="s" s="3"><v>…</v></c>. */
    private static final class Handler extends DefaultHandler {
        private final ReadOnlySharedStringsTable strings;
        private final StylesTable styles;
        private final List<List<SheetInput.Cell>> rows;
        private List<SheetInput.Cell> row;
        private int rowNumber;
        private int nextColumn;
        private String type;
        private int style;
        private int cellRow;
        private int cellColumn;
        private final StringBuilder text = new StringBuilder();
        private boolean collecting;
        private boolean inCell;

        Handler(ReadOnlySharedStringsTable strings, StylesTable styles, List<List<SheetInput.Cell>> rows) {
            this.strings = strings;
            this.styles = styles;
            this.rows = rows;
        }

        @Override public void startElement(String uri, String local, String qName, Attributes atts) {
            String name = local.isEmpty() ? qName : local;
            switch (name) {
                case "row": {
                    String r = atts.getValue("r");
                    rowNumber = r == null ? rowNumber + 1 : Integer.parseInt(r);
                    nextColumn = 1;
                    row = new ArrayList<>();
                    break;
                }
                case "c": {
                    inCell = true;
                    type = atts.getValue("t");
                    String s = atts.getValue("s");
                    style = s == null ? -1 : Integer.parseInt(s);
                    String ref = atts.getValue("r");
                    cellRow = rowNumber;
                    cellColumn = ref == null ? nextColumn : column(ref);
                    nextColumn = cellColumn + 1;
                    text.setLength(0);
                    break;
                }
                case "v":
                case "t":
                    if (inCell) collecting = true;
                    break;
                default:
                    break;
            }
        }

        @Override public void characters(char[] ch, int start, int length) {
            if (collecting) text.append(ch, start, length);
        }

        @Override public void endElement(String uri, String local, String qName) {
            String name = local.isEmpty() ? qName : local;
            switch (name) {
                case "v":
                case "t":
                    collecting = false;
                    break;
                case "c":
                    inCell = false;
                    Object value = value(text.toString());
                    // A text cell holding nothing is an empty text given (approved_by: ""), unlike a blank cell.
                    if (value != null && !(value instanceof String s && s.isBlank() && !s.isEmpty())) row.add(new SheetInput.Cell(cellRow, cellColumn, value));
                    break;
                case "row":
                    if (!row.isEmpty()) rows.add(row);
                    break;
                default:
                    break;
            }
        }

        private Object value(String raw) {
            if (type == null || type.equals("n")) {
                if (raw.isEmpty()) return null;
                double d = Double.parseDouble(raw);
                if (style >= 0 && isDate(style) && DateUtil.isValidExcelDate(d)) {
                    return DateUtil.getLocalDateTime(d).toLocalDate();
                }
                return d;
            }
            switch (type) {
                case "s":
                    return raw.isEmpty() ? null : strings.getItemAt(Integer.parseInt(raw.strip())).getString();
                case "b":
                    return "1".equals(raw.strip());
                case "e":
                    return "#" + raw;
                default:
                    // inlineStr, str (a formula's text), d (an ISO date)
                    return raw;
            }
        }

        private boolean isDate(int styleIndex) {
            XSSFCellStyle st = styles.getStyleAt(styleIndex);
            if (st == null) return false;
            return DateUtil.isADateFormat(st.getDataFormat(), st.getDataFormatString());
        }

        static int column(String ref) {
            int c = 0;
            for (int i = 0; i < ref.length(); i++) {
                char ch = Character.toUpperCase(ref.charAt(i));
                if (ch < 'A' || ch > 'Z') break;
                c = c * 26 + (ch - 'A' + 1);
            }
            return c;
        }
    }
}
