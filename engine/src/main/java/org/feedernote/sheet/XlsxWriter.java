package org.feedernote.sheet;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.time.LocalDateTime;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.usermodel.BorderStyle;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.ClientAnchor;
import org.apache.poi.ss.usermodel.Comment;
import org.apache.poi.ss.usermodel.DataValidation;
import org.apache.poi.ss.usermodel.DataValidationConstraint;
import org.apache.poi.ss.usermodel.DataValidationHelper;
import org.apache.poi.ss.usermodel.Drawing;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.IndexedColors;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.CellRangeAddressList;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;

/**
 * Writes tables as an .xlsx workbook, streamed (POI's SXSSF: a hundred rows in memory at a time):
 * typed cells, a frozen header, a filter, validation lists, comments on the headers, and the
 * failing rows marked. The same tables give the same bytes: the document's date is given, and
 * every zip entry's time is pinned.
 */
public final class XlsxWriter {
    private XlsxWriter() {}

    static {
        org.feedernote.input.PoiLogging.quiet();
    }

    /** Zip entries' time: the bytes must not depend on the clock. */
    private static final LocalDateTime ENTRY_TIME = LocalDateTime.of(2000, 1, 1, 0, 0);

    /** Excel refuses an explicit validation list longer than this (its formula's limit). */
    private static final int LIST_LIMIT = 255;

    /** date: the document's creation date, YYYY-MM-DD (the project's, so that the clock is never read). */
    public static void write(List<Table> tables, String date, OutputStream out) throws IOException {
        ByteArrayOutputStream raw = new ByteArrayOutputStream(1 << 16);
        SXSSFWorkbook wb = new SXSSFWorkbook(100);
        try {
            wb.setCompressTempFiles(false);
            var core = wb.getXSSFWorkbook().getProperties().getCoreProperties();
            core.setCreated(java.util.Optional.of(java.util.Date.from(
                    java.time.LocalDate.parse(date).atStartOfDay(java.time.ZoneOffset.UTC).toInstant())));
            core.setCreator("feedernote");
            Styles styles = new Styles(wb);
            for (Table t : tables) sheet(wb, t, styles);
            wb.write(raw);
        } finally {
            wb.close();
        }
        pin(raw.toByteArray(), out);
    }

    /**
     * Every entry's time set to a fixed one, in place: the DOS time and date of each central
     * directory record and of the local header it points to. Nothing is compressed again (a copy
     * through java.util.zip cost a second for 10 000 circuits).
     */
    static void pin(byte[] zip, OutputStream out) throws IOException {
        java.nio.ByteBuffer b = java.nio.ByteBuffer.wrap(zip).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        int end = -1;
        for (int i = zip.length - 22; i >= Math.max(0, zip.length - 22 - 65_535); i--) {
            if (b.getInt(i) == 0x06054b50) {
                end = i;
                break;
            }
        }
        if (end < 0) throw new IOException("the workbook written is not a zip archive");
        int entries = Short.toUnsignedInt(b.getShort(end + 10));
        int at = b.getInt(end + 16);
        short time = (short) ((ENTRY_TIME.getHour() << 11) | (ENTRY_TIME.getMinute() << 5) | (ENTRY_TIME.getSecond() / 2));
        short date = (short) (((ENTRY_TIME.getYear() - 1980) << 9) | (ENTRY_TIME.getMonthValue() << 5) | ENTRY_TIME.getDayOfMonth());
        for (int i = 0; i < entries; i++) {
            if (b.getInt(at) != 0x02014b50) throw new IOException("the workbook written has a damaged zip directory");
            b.putShort(at + 12, time);
            b.putShort(at + 14, date);
            int local = b.getInt(at + 42);
            if (b.getInt(local) != 0x04034b50) throw new IOException("the workbook written has a damaged zip entry");
            b.putShort(local + 10, time);
            b.putShort(local + 12, date);
            at += 46 + Short.toUnsignedInt(b.getShort(at + 28)) + Short.toUnsignedInt(b.getShort(at + 30))
                    + Short.toUnsignedInt(b.getShort(at + 32));
        }
        out.write(zip);
        out.flush();
    }

    private static final class Styles {
        final SXSSFWorkbook wb;
        final CellStyle header;
        final CellStyle units;
        /**
         * The workbook's default style, set on every cell that has no other: a cell without one is
         * written with it too, but POI looks for the column's style first (a search of the column
         * definitions per cell, two fifths of the writing).
         */
        final CellStyle plain;
        final Map<String, CellStyle> cache = new HashMap<>();

        Styles(SXSSFWorkbook wb) {
            this.wb = wb;
            plain = wb.getCellStyleAt(0);
            Font bold = wb.createFont();
            bold.setBold(true);
            header = wb.createCellStyle();
            header.setFont(bold);
            header.setWrapText(true);
            header.setBorderBottom(BorderStyle.THIN);
            Font italic = wb.createFont();
            italic.setItalic(true);
            italic.setColor(IndexedColors.GREY_50_PERCENT.getIndex());
            units = wb.createCellStyle();
            units.setFont(italic);
            units.setBorderBottom(BorderStyle.THIN);
        }

        /** fill: 0 none, 1 failing row, 2 the governing check. */
        CellStyle of(String format, int fill) {
            if (format == null && fill == 0) return plain;
            String key = format + "|" + fill;
            CellStyle s = cache.get(key);
            if (s != null) return s;
            s = wb.createCellStyle();
            if (format != null) s.setDataFormat(wb.createDataFormat().getFormat(format));
            if (fill != 0) {
                s.setFillForegroundColor(fill == 1 ? IndexedColors.ROSE.getIndex() : IndexedColors.LIGHT_YELLOW.getIndex());
                s.setFillPattern(FillPatternType.SOLID_FOREGROUND);
            }
            cache.put(key, s);
            return s;
        }
    }

    private static void sheet(SXSSFWorkbook wb, Table t, Styles styles) {
        SXSSFSheet sheet = wb.createSheet(t.name());
        int n = t.columns().size();
        Drawing<?> drawing = null;
        Row head = sheet.createRow(0);
        for (int i = 0; i < n; i++) {
            Table.Column c = t.columns().get(i);
            Cell cell = head.createCell(i);
            cell.setCellValue(t.heading(i));
            cell.setCellStyle(styles.header);
            if (c.comment() != null && !c.comment().isEmpty()) {
                if (drawing == null) drawing = sheet.createDrawingPatriarch();
                ClientAnchor anchor = wb.getCreationHelper().createClientAnchor();
                anchor.setCol1(i);
                anchor.setCol2(i + 4);
                anchor.setRow1(0);
                anchor.setRow2(6);
                Comment comment = drawing.createCellComment(anchor);
                comment.setString(wb.getCreationHelper().createRichTextString(c.comment()));
                comment.setAuthor("feedernote");
                cell.setCellComment(comment);
            }
            sheet.setColumnWidth(i, Math.min(60, Math.max(10, t.heading(i).length() + 2)) * 256);
        }
        int first = 1;
        if (t.keyed()) {
            Row unitRow = sheet.createRow(1);
            for (int i = 0; i < n; i++) {
                String unit = t.columns().get(i).unit();
                if (unit == null) continue;
                Cell cell = unitRow.createCell(i);
                cell.setCellValue("(" + unit + ")");
                cell.setCellStyle(styles.units);
            }
            first = 2;
        }
        sheet.createFreezePane(t.columns().get(0).heading().equals("key") ? 1 : 0, first);
        DataValidationHelper dv = sheet.getDataValidationHelper();
        // Per column, fill and whether the value is a number: the style, looked up once.
        CellStyle[] styleAt = new CellStyle[n * 6];
        int r = first;
        for (Table.Row row : t.rows()) {
            Row out = sheet.createRow(r);
            for (int i = 0; i < row.cells().size() && i < n; i++) {
                Object v = row.cells().get(i);
                if (v == null) continue;
                Cell cell = out.createCell(i);
                if (v instanceof Number num) cell.setCellValue(num.doubleValue());
                else if (v instanceof Boolean b) cell.setCellValue(b);
                else cell.setCellValue(v.toString());
                int fill = i == row.markedColumn() ? 2 : row.failing() ? 1 : 0;
                boolean number = v instanceof Number;
                int slot = (i * 3 + fill) * 2 + (number ? 1 : 0);
                CellStyle style = styleAt[slot];
                if (style == null) {
                    style = styles.of(number ? t.columns().get(i).format() : null, fill);
                    styleAt[slot] = style;
                }
                cell.setCellStyle(style);
            }
            if (!row.choices().isEmpty()) validate(sheet, dv, row.choices(), r, r, 1);
            r++;
        }
        int last = Math.max(r - 1, first + t.validatedRows() - 1);
        for (int i = 0; i < n; i++) {
            List<String> choices = t.columns().get(i).choices();
            if (!choices.isEmpty() && last >= first) validate(sheet, dv, choices, first, last, i);
        }
        sheet.setAutoFilter(new CellRangeAddress(first - 1, Math.max(first - 1, r - 1), 0, n - 1));
    }

    private static void validate(SXSSFSheet sheet, DataValidationHelper dv, List<String> choices, int firstRow, int lastRow, int col) {
        if (String.join(",", choices).length() > LIST_LIMIT) return;
        DataValidationConstraint list = dv.createExplicitListConstraint(choices.toArray(new String[0]));
        DataValidation v = dv.createValidation(list, new CellRangeAddressList(firstRow, lastRow, col, col));
        v.setShowErrorBox(true);
        v.setSuppressDropDownArrow(true);
        v.setErrorStyle(DataValidation.ErrorStyle.STOP);
        v.createErrorBox("Not allowed", "Choose one of: " + String.join(", ", choices));
        sheet.addValidationData(v);
    }
}
