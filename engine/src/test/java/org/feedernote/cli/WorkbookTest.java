package org.feedernote.cli;

import static org.junit.jupiter.api.Assertions.*;

import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DataValidation;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import org.feedernote.Fixtures;
import org.feedernote.calc.Engine;
import org.feedernote.data.ReferenceData;
import org.feedernote.input.InputReader;
import org.feedernote.input.SheetColumns;
import org.feedernote.input.SheetInput;
import org.feedernote.model.Installation;
import org.feedernote.report.ResultJson;

/**
 * Schedules in and out: a design input goes through a workbook (and CSV files) and back to the
 * same canonical input and the same results; an edited workbook reads back; a wrong cell is named
 * by sheet and cell; the exported schedule has typed cells, lists, frozen headers and filters.
 * The inputs are the project's invented examples; the only reference is the YAML's own result.
 */
class WorkbookTest {
    static Stream<Path> inputs() {
        return Stream.of(Fixtures.inputs().resolve("bakery-small.yaml"), Fixtures.inputs().resolve("sports-hall.yaml"),
                Fixtures.root().resolve("engine/src/test/resources/trial/kestrel-yard.yaml"));
    }

    private static String results(Installation inst) {
        return ResultJson.write(new Engine(ReferenceData.standard()).run(inst));
    }

    @ParameterizedTest
    @MethodSource("inputs")
    void anInputGoesThroughAWorkbookAndBackUnchanged(Path yaml, @TempDir Path dir) throws Exception {
        Installation original = InputReader.read(yaml);
        Path xlsx = dir.resolve("in.xlsx");
        CommandLineTest.Run w = CommandLineTest.run("workbook", yaml.toString(), "-o", xlsx.toString());
        assertEquals(0, w.status(), w.err());
        Installation fromSheet = SheetInput.read(xlsx);
        assertEquals(original.canonicalJson(), fromSheet.canonicalJson());
        assertEquals(results(original), results(fromSheet));

        Path back = dir.resolve("back.yaml");
        CommandLineTest.Run y = CommandLineTest.run("workbook", xlsx.toString(), "-o", back.toString());
        assertEquals(0, y.status(), y.err());
        assertEquals(original.canonicalJson(), InputReader.read(back).canonicalJson());

        Path csv = dir.resolve("csv");
        CommandLineTest.Run c = CommandLineTest.run("workbook", yaml.toString(), "--csv", csv.toString());
        assertEquals(0, c.status(), c.err());
        assertEquals(original.canonicalJson(), SheetInput.read(csv).canonicalJson());
        assertEquals(original.canonicalJson(), SheetInput.read(csv.resolve("circuits.csv")).canonicalJson());
    }

    @ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"revision: \"3\"", "revision: 3"})
    void aRevisionThatLooksLikeANumberSurvivesCsvFilesWhichHaveNoTypes(String revision, @TempDir Path dir) throws Exception {
        // A text field given as a number is read as text: as text or as a number, the same input.
        Path yaml = dir.resolve("r.yaml");
        java.nio.file.Files.writeString(yaml, java.nio.file.Files.readString(Fixtures.inputs().resolve("bakery-small.yaml"))
                .replace("revision: A", revision));
        Installation original = InputReader.read(yaml);
        Path csv = dir.resolve("csv");
        assertEquals(0, CommandLineTest.run("workbook", yaml.toString(), "--csv", csv.toString()).status());
        Path back = dir.resolve("back.yaml");
        assertEquals(0, CommandLineTest.run("workbook", csv.toString(), "-o", back.toString()).status());
        assertEquals(original.canonicalJson(), SheetInput.read(csv).canonicalJson());
        assertEquals(original.canonicalJson(), InputReader.read(back).canonicalJson());
        assertTrue(original.canonicalJson().contains("\"revision\":\"3\""), original.canonicalJson());
    }

    @Test
    void aWorkbookEditedInASpreadsheetProgramReadsBack(@TempDir Path dir) throws Exception {
        Path yaml = Fixtures.inputs().resolve("sports-hall.yaml");
        Path xlsx = dir.resolve("in.xlsx");
        assertEquals(0, CommandLineTest.run("workbook", yaml.toString(), "-o", xlsx.toString()).status());
        Path edited = dir.resolve("edited.xlsx");
        rewrite(xlsx, edited);
        assertEquals(InputReader.read(yaml).canonicalJson(), SheetInput.read(edited).canonicalJson());
    }

    /**
     * As a user might leave it: the circuits' and boards' columns in reverse order, every number of
     * the circuits retyped as text, a blank row after every row, a sheet of notes before the others.
     */
    private static void rewrite(Path from, Path to) throws Exception {
        try (InputStream in = Files.newInputStream(from); XSSFWorkbook src = new XSSFWorkbook(in); XSSFWorkbook out = new XSSFWorkbook()) {
            out.createSheet("notes").createRow(3).createCell(2).setCellValue("site survey 12 March");
            for (Sheet s : src) {
                Sheet t = out.createSheet(s.getSheetName().toUpperCase(java.util.Locale.ROOT));
                boolean reverse = !s.getSheetName().equals("project");
                boolean asText = s.getSheetName().equals("circuits");
                int width = 0;
                for (Row r : s) width = Math.max(width, r.getLastCellNum());
                int outRow = 0;
                for (Row r : s) {
                    Row o = t.createRow(outRow);
                    outRow += 2;
                    for (Cell c : r) {
                        int col = reverse ? width - 1 - c.getColumnIndex() : c.getColumnIndex();
                        Cell n = o.createCell(col);
                        if (c.getCellType() == CellType.NUMERIC) {
                            double d = c.getNumericCellValue();
                            String text = d == Math.rint(d) ? Long.toString((long) d) : Double.toString(d);
                            if (asText) n.setCellValue(" " + text);
                            else n.setCellValue(d);
                        } else if (c.getCellType() == CellType.STRING) {
                            n.setCellValue(c.getStringCellValue());
                        } else if (c.getCellType() == CellType.BOOLEAN) {
                            n.setCellValue(c.getBooleanCellValue());
                        }
                    }
                }
            }
            try (OutputStream os = Files.newOutputStream(to)) {
                out.write(os);
            }
        }
    }

    @Test
    void aWrongCellIsNamedBySheetAndCellAndExitsTwo(@TempDir Path dir) throws Exception {
        Path xlsx = dir.resolve("in.xlsx");
        assertEquals(0, CommandLineTest.run("workbook", Fixtures.inputs().resolve("bakery-small.yaml").toString(), "-o", xlsx.toString()).status());
        String cell;
        try (InputStream in = Files.newInputStream(xlsx); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            Sheet circuits = wb.getSheet("circuits");
            int col = column(circuits, "cable.size_mm2");
            Row row = circuits.getRow(3);
            row.getCell(col).setCellValue(3);
            cell = new CellReference(3, col).formatAsString(false);
            Sheet boards = wb.getSheet("boards");
            boards.getRow(2).getCell(column(boards, "diversity"), Row.MissingCellPolicy.CREATE_NULL_AS_BLANK).setCellValue("most");
            try (OutputStream os = Files.newOutputStream(xlsx)) {
                wb.write(os);
            }
        }
        CommandLineTest.Run r = CommandLineTest.run("check", xlsx.toString());
        assertEquals(2, r.status(), r.err());
        // 3 mm² is not in IEC 60228's series of nominal cross-sections (2.5 and 4 are).
        assertTrue(r.err().contains(xlsx + ": circuits!" + cell + ": cable.size_mm2: expected a standard size in mm² (1, 1.5, 2.5, 4"), r.err());
        assertTrue(r.err().contains("(nearest: 2.5 or 4)"), r.err());
        assertTrue(r.err().contains("boards!"), r.err());
        assertTrue(r.err().contains(": diversity: expected a number"), r.err());
        assertTrue(r.err().contains("2 errors"), r.err());
    }

    private static int column(Sheet s, String key) {
        for (Cell c : s.getRow(0)) if (c.getStringCellValue().equals(key)) return c.getColumnIndex();
        throw new AssertionError("no column " + key);
    }

    @Test
    void theTemplateHasEveryKeyItsUnitAListAndAComment(@TempDir Path dir) throws Exception {
        Path xlsx = dir.resolve("template.xlsx");
        assertEquals(0, CommandLineTest.run("workbook", "-o", xlsx.toString()).status());
        try (InputStream in = Files.newInputStream(xlsx); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            XSSFSheet circuits = wb.getSheet("circuits");
            List<String> headers = new ArrayList<>();
            for (Cell c : circuits.getRow(0)) headers.add(c.getStringCellValue());
            assertEquals(SheetColumns.circuits().stream().map(SheetColumns.Column::key).toList(), headers);
            assertEquals("(mm²)", circuits.getRow(1).getCell(column(circuits, "cable.size_mm2")).getStringCellValue());
            assertNotNull(circuits.getRow(0).getCell(column(circuits, "installation.method")).getCellComment());
            List<String> methods = null;
            for (DataValidation v : circuits.getDataValidations()) {
                if (v.getRegions().getCellRangeAddress(0).getFirstColumn() == column(circuits, "installation.method")) {
                    methods = List.of(v.getValidationConstraint().getExplicitListValues());
                }
            }
            // The reference installation methods of IEC 60364-5-52:2009, Table B.52.1 (A1 to G).
            assertEquals(List.of("A1", "A2", "B1", "B2", "C", "D1", "D2", "E", "F", "G"), methods);
            assertEquals(2, circuits.getPaneInformation().getHorizontalSplitPosition());
        }
    }

    @Test
    void theScheduleHasTypedFiguresFrozenHeadersFiltersAndMarksFailingRows(@TempDir Path dir) throws Exception {
        String failing = Files.readString(Fixtures.inputs().resolve("bakery-small.yaml")).replaceFirst("length_m: \\d+", "length_m: 900");
        Path input = dir.resolve("long.yaml");
        Files.writeString(input, failing);
        Path xlsx = dir.resolve("schedule.xlsx");
        CommandLineTest.Run r = CommandLineTest.run("check", input.toString(), "--xlsx", xlsx.toString(), "--csv", dir.resolve("csv").toString());
        assertEquals(1, r.status(), r.err());
        byte[] first = Files.readAllBytes(xlsx);
        assertEquals(1, CommandLineTest.run("check", input.toString(), "--xlsx", xlsx.toString()).status());
        assertArrayEquals(first, Files.readAllBytes(xlsx), "the same input gives the same bytes");
        Installation inst = InputReader.read(input);
        try (InputStream in = Files.newInputStream(xlsx); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            XSSFSheet all = wb.getSheet("schedule");
            assertEquals(1, all.getPaneInformation().getHorizontalSplitPosition());
            assertTrue(all.getCTWorksheet().isSetAutoFilter());
            assertEquals(inst.circuits().size(), all.getLastRowNum());
            int ib = column(all, "I_b (A)");
            int verdict = column(all, "verdict");
            boolean sawFail = false;
            for (int i = 1; i <= all.getLastRowNum(); i++) {
                Row row = all.getRow(i);
                assertEquals(CellType.NUMERIC, row.getCell(ib).getCellType());
                if (row.getCell(verdict).getStringCellValue().equals("FAIL")) {
                    sawFail = true;
                    assertEquals(FillPatternType.SOLID_FOREGROUND, row.getCell(verdict).getCellStyle().getFillPattern());
                }
            }
            assertTrue(sawFail);
            XSSFSheet boards = wb.getSheet("boards");
            assertEquals(CellType.NUMERIC, boards.getRow(1).getCell(column(boards, "Ik3 (kA)")).getCellType());
            assertEquals(2 + inst.boards().size(), wb.getNumberOfSheets());
        }
        assertTrue(Files.readString(dir.resolve("csv/schedule.csv")).startsWith("board,circuit,description"));
    }
}
