package org.feedernote.report.figure;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.calc.BoardResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.formula.Units;
import org.feedernote.model.Supply;
import org.feedernote.report.NumberFormatPolicy;
import org.feedernote.report.pdf.Figure;
import org.feedernote.report.pdf.FigureFonts;

/**
 * The single-line diagram of an installation, drawn from the board tree of its result: the supply
 * at the top, each board as a box with a vertical busbar below it, its final circuits as
 * horizontal branches off the busbar (device, cable, load, id), then its feeders, each dropping to
 * the board it feeds, drawn one level in. A board whose circuits do not fit the rest of a sheet
 * gets a sheet of its own, and the feeder names that sheet; a board with more circuits than a
 * sheet holds continues on the next. Every figure printed is one of the result's.
 *
 * <p>The layout is our own: the tree is shallow, one branch per row, and page by page; a layered
 * graph layout would neither split it over sheets nor keep every label on one line.
 */
public final class SingleLineDiagram {
    /** The width the sheets are laid out for: A4 less the note's margins; drawn scaled to the body's width. */
    static final float WIDTH = 482f;
    /** The tallest a sheet may be: it fits the page under a section heading. */
    static final float MAX_HEIGHT = 640f;

    private static final float LEFT = 4f;
    private static final float INDENT = 24f;
    private static final float TOP = 30f;
    private static final float ROW = 21f;
    private static final float SOURCE = 30f;
    private static final float BOARD = 22f;
    /** A line of failing checks' names under a row. */
    private static final float FAIL_LINE = 7f;
    /** Space above a board that shares a sheet with the board before it. */
    private static final float GAP = 12f;
    private static final float NOTE = 11f;
    private static final float FEEDER = 40f;
    private static final float REFERENCE = 20f;
    private static final float CONTINUES = 20f;
    /** Where the FAIL marks stand, from the right edge. */
    private static final float FAIL_COLUMN = 58f;
    private static final float BOTTOM = MAX_HEIGHT - CONTINUES - 4f;

    private static final Color INK = Color.BLACK;
    private static final Color FAIL = new Color(0xb0, 0x00, 0x00);
    private static final Color QUIET = new Color(0x44, 0x44, 0x44);

    private SingleLineDiagram() {}

    /** One element of a sheet, {@code top} points from the sheet's top. */
    private sealed interface Element permits Source, BoardHead, Final, Feeder, Continues {}

    private record Source(float top) implements Element {}

    /** A board's box; note says where it came from when it opens a sheet. */
    private record BoardHead(BoardResult board, int depth, float top, String note) implements Element {}

    private record Final(CircuitResult circuit, int depth, float top) implements Element {}

    /** A feeder; where its board is on another sheet, {@code elsewhere} (and the reference is drawn). */
    private record Feeder(CircuitResult circuit, BoardResult to, int depth, float top, boolean elsewhere) implements Element {}

    /** The busbar of the sheet's first board continues on the next sheet. */
    private record Continues(BoardResult board, float top) implements Element {}

    private record Sheet(List<Element> elements, float height) {}

    /** A board laid out on a sheet of its own, and where it is fed from. */
    private record Pending(BoardResult board, int fromSheet, String feeder, String fromBoard) {}

    /** The sheets of the diagram, in order. */
    public static List<Figure> sheets(Result result, FigureFonts fonts) {
        Tree tree = new Tree(result);
        Columns columns = Columns.of(result, fonts);
        Layout layout = new Layout(tree, new Fails(fonts, columns));
        layout.run();
        Map<String, Integer> firstSheet = layout.firstSheet;
        List<Figure> out = new ArrayList<>();
        for (int i = 0; i < layout.sheets.size(); i++) {
            out.add(new SheetFigure(layout.sheets.get(i), i + 1, layout.sheets.size(), result, firstSheet, columns, layout.fails, fonts));
        }
        return List.copyOf(out);
    }

    /** The board tree: the origin, each board's final circuits and feeders in input order. */
    private static final class Tree {
        final BoardResult origin;
        final Map<String, BoardResult> boards = new LinkedHashMap<>();
        final Map<String, List<CircuitResult>> finals = new HashMap<>();
        final Map<String, List<CircuitResult>> feeders = new HashMap<>();
        final Map<String, Float> height = new HashMap<>();

        Fails fails;

        Tree(Result result) {
            BoardResult first = null;
            for (BoardResult b : result.boards()) {
                boards.put(b.id(), b);
                finals.put(b.id(), new ArrayList<>());
                feeders.put(b.id(), new ArrayList<>());
                if (b.fedBy() == null && first == null) first = b;
            }
            origin = first;
            for (CircuitResult c : result.circuits()) {
                List<CircuitResult> list = (c.circuit().isFeeder() ? feeders : finals).get(c.circuit().from());
                if (list != null) list.add(c);
            }
        }

        /** The height of a board's whole subtree drawn on one sheet. */
        float subtree(String board) {
            Float known = height.get(board);
            if (known != null) return known;
            float h = fails.board(boards.get(board));
            for (CircuitResult c : finals.get(board)) h += fails.row(c);
            for (CircuitResult f : feeders.get(board)) h += fails.feeder(f) + subtree(f.circuit().to());
            height.put(board, h);
            return h;
        }
    }

    /** Puts the tree's elements on sheets (see the class comment). */
    private static final class Layout {
        final Tree tree;
        final List<Sheet> sheets = new ArrayList<>();
        final Map<String, Integer> firstSheet = new HashMap<>();
        final Deque<Pending> pending = new ArrayDeque<>();
        List<Element> current;
        float y;

        final Fails fails;

        Layout(Tree tree, Fails fails) {
            this.tree = tree;
            this.fails = fails;
            tree.fails = fails;
        }

        void run() {
            open();
            current.add(new Source(y));
            y += SOURCE;
            if (tree.origin != null) root(tree.origin, null);
            while (!pending.isEmpty()) {
                Pending p = pending.removeFirst();
                // Boards fed from other sheets share a sheet while they fit whole.
                if (y + GAP + NOTE + tree.subtree(p.board().id()) <= BOTTOM) {
                    y += GAP;
                } else {
                    close();
                    open();
                }
                root(p.board(), "fed from diagram sheet " + p.fromSheet() + ", feeder " + p.feeder() + " of " + p.fromBoard());
            }
            close();
        }

        private void open() {
            current = new ArrayList<>();
            y = TOP;
        }

        private void close() {
            sheets.add(new Sheet(List.copyOf(current), Math.min(MAX_HEIGHT, y + 6)));
        }

        private int sheetNumber() {
            return sheets.size() + 1;
        }

        /** The board that opens a sheet: its circuits continue on further sheets when they do not fit. */
        private void root(BoardResult board, String note) {
            firstSheet.put(board.id(), sheetNumber());
            head(board, 0, note);
            for (CircuitResult c : tree.finals.get(board.id())) {
                if (y + fails.row(c) > BOTTOM) carryOn(board);
                add(new Final(c, 0, y), fails.row(c));
            }
            for (CircuitResult f : tree.feeders.get(board.id())) {
                BoardResult child = tree.boards.get(f.circuit().to());
                if (y + fails.feeder(f) + tree.subtree(child.id()) <= BOTTOM) {
                    add(new Feeder(f, child, 0, y, false), fails.feeder(f));
                    inline(child, 1);
                } else {
                    if (y + fails.feeder(f) + REFERENCE > BOTTOM) carryOn(board);
                    add(new Feeder(f, child, 0, y, true), fails.feeder(f) + REFERENCE);
                    pending.add(new Pending(child, sheetNumber(), f.id(), board.id()));
                }
            }
        }

        /** A board drawn whole under its feeder (its subtree was measured to fit). */
        private void inline(BoardResult board, int depth) {
            firstSheet.put(board.id(), sheetNumber());
            head(board, depth, null);
            for (CircuitResult c : tree.finals.get(board.id())) add(new Final(c, depth, y), fails.row(c));
            for (CircuitResult f : tree.feeders.get(board.id())) {
                BoardResult child = tree.boards.get(f.circuit().to());
                add(new Feeder(f, child, depth, y, false), fails.feeder(f));
                inline(child, depth + 1);
            }
        }

        private void head(BoardResult board, int depth, String note) {
            add(new BoardHead(board, depth, y, note), fails.board(board) + (note == null ? 0 : NOTE));
        }

        private void carryOn(BoardResult board) {
            current.add(new Continues(board, y));
            y += CONTINUES;
            int from = sheetNumber();
            close();
            open();
            head(board, 0, board.id() + " continued from diagram sheet " + from);
        }

        private void add(Element e, float height) {
            current.add(e);
            y += height;
        }
    }

    /** Where the branches' texts stand, the same on every sheet so the loads line up. */
    private record Columns(float device, float cable, float load) {
        static Columns of(Result result, FigureFonts fonts) {
            int deepest = depthOfDeepestBoard(result);
            Font label = fonts.regular(7f);
            float device = 0;
            float cable = 0;
            for (CircuitResult c : result.circuits()) {
                if (c.circuit().isFeeder()) continue;
                device = Math.max(device, FigureFonts.width(label, Labels.device(c)));
                cable = Math.max(cable, FigureFonts.width(label, Labels.cable(c)));
            }
            float load = bus(deepest) + 22 + device + 8 + cable + 8;
            return new Columns(device, cable, Math.min(load, WIDTH - FAIL_COLUMN - 120));
        }
    }

    /** How many feeders lie between the origin and the board farthest from it. */
    private static int depthOfDeepestBoard(Result result) {
        Map<String, String> fedFrom = new HashMap<>();
        for (CircuitResult c : result.circuits()) if (c.circuit().isFeeder()) fedFrom.put(c.circuit().to(), c.circuit().from());
        int deepest = 0;
        for (BoardResult b : result.boards()) {
            int d = 0;
            for (String at = b.id(); fedFrom.containsKey(at) && d <= result.boards().size(); at = fedFrom.get(at)) d++;
            deepest = Math.max(deepest, d);
        }
        return deepest;
    }

    /**
     * The names of the failing checks, broken into the lines they take under a row, and so the
     * heights of the rows: the names are never cut.
     */
    private static final class Fails {
        private final Font font;
        private final float room;

        Fails(FigureFonts fonts, Columns columns) {
            this.font = fonts.bold(6.2f);
            this.room = WIDTH - columns.load() - 9 - 4;
        }

        List<String> lines(List<org.feedernote.calc.CheckResult> checks, float width) {
            List<String> lines = new ArrayList<>();
            StringBuilder line = new StringBuilder("fails: ");
            String names = Labels.failing(checks);
            if (names.isEmpty()) return lines;
            for (String name : names.split(", ")) {
                String next = line.length() == 7 ? line + name : line + ", " + name;
                if (line.length() > 7 && FigureFonts.width(font, next) > width) {
                    lines.add(line.append(',').toString());
                    line = new StringBuilder(name);
                } else {
                    line = new StringBuilder(next);
                }
            }
            lines.add(line.toString());
            return lines;
        }

        float row(CircuitResult c) {
            return c.pass() ? ROW : ROW + 3 + (lines(c.checks(), room).size() - 1) * FAIL_LINE;
        }

        float feeder(CircuitResult c) {
            return c.pass() ? FEEDER : FEEDER + lines(c.checks(), WIDTH - 200).size() * FAIL_LINE;
        }

        float board(BoardResult b) {
            return b.pass() ? BOARD : BOARD + lines(b.checks(), WIDTH - 200).size() * FAIL_LINE;
        }
    }

    private static float box(int depth) {
        return LEFT + depth * INDENT;
    }

    private static float bus(int depth) {
        return box(depth) + 7;
    }

    /** One sheet, drawn. */
    private static final class SheetFigure implements Figure {
        private final Sheet sheet;
        private final int number;
        private final int of;
        private final Result result;
        private final Fails fails;
        private final Map<String, Integer> firstSheet;
        private final Columns columns;
        private final Font label;
        private final Font id;
        private final Font boardFont;
        private final Font small;
        private final Font caption;
        private final Font failFont;
        private final FigureFonts fonts;

        SheetFigure(Sheet sheet, int number, int of, Result result, Map<String, Integer> firstSheet, Columns columns, Fails fails,
                    FigureFonts fonts) {
            this.sheet = sheet;
            this.number = number;
            this.of = of;
            this.result = result;
            this.fails = fails;
            this.firstSheet = firstSheet;
            this.columns = columns;
            this.fonts = fonts;
            this.label = fonts.regular(7f);
            this.id = fonts.bold(7f);
            this.boardFont = fonts.bold(8f);
            this.small = fonts.regular(6.2f);
            this.caption = fonts.bold(8.5f);
            this.failFont = fonts.bold(7.5f);
        }

        @Override public float height(float width) {
            return sheet.height() * width / WIDTH;
        }

        @Override public void draw(Graphics2D g, float width, float height) {
            g.scale(width / WIDTH, width / WIDTH);
            g.setColor(INK);
            g.setStroke(new BasicStroke(0.7f));
            text(g, caption, "Single-line diagram, sheet " + number + " of " + of, LEFT, 10);
            legend(g, 21);
            // Busbars first, then every element over them.
            Map<String, float[]> bars = busbars();
            g.setStroke(new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER));
            for (float[] b : bars.values()) if (b[2] > b[1]) g.draw(new Line2D.Float(b[0], b[1], b[0], b[2]));
            g.setStroke(new BasicStroke(0.7f));
            for (Element e : sheet.elements()) {
                if (e instanceof Source s) source(g, s);
                else if (e instanceof BoardHead b) board(g, b);
                else if (e instanceof Final f) finalCircuit(g, f);
                else if (e instanceof Feeder f) feeder(g, f);
                else continues(g, (Continues) e);
            }
        }

        /** Per board on this sheet: x, the busbar's top and its lowest tap. */
        private Map<String, float[]> busbars() {
            Map<String, float[]> bars = new LinkedHashMap<>();
            for (Element e : sheet.elements()) {
                if (e instanceof BoardHead b) {
                    float top = b.top() + (b.note() == null ? 0 : NOTE) + 16;
                    bars.put(b.board().id(), new float[] {bus(b.depth()), top, top});
                } else if (e instanceof Final f) {
                    bars.get(f.circuit().circuit().from())[2] = f.top() + 11;
                } else if (e instanceof Feeder f) {
                    bars.get(f.circuit().circuit().from())[2] = f.top() + 6;
                } else if (e instanceof Continues c) {
                    bars.get(c.board().id())[2] = c.top() + 8;
                }
            }
            return bars;
        }

        private void legend(Graphics2D g, float baseline) {
            float x = LEFT;
            float mid = baseline - 2;
            deviceSymbol(g, x + 5, mid, true);
            x = text(g, small, "protective device", x + 13, baseline) + 10;
            loadSymbol(g, x + 3, mid);
            x = text(g, small, "load", x + 10, baseline) + 10;
            g.setStroke(new BasicStroke(2.2f));
            g.draw(new Line2D.Float(x + 2, baseline - 6, x + 2, baseline + 1));
            g.setStroke(new BasicStroke(0.7f));
            x = text(g, small, "busbar of a board", x + 8, baseline) + 10;
            g.setColor(FAIL);
            x = text(g, fonts.bold(6.2f), "× FAIL", x, baseline);
            g.setColor(INK);
            text(g, small, " a check of the circuit or board fails (named); I_b design current; ΔU drop from the origin", x, baseline);
        }

        private void source(Graphics2D g, Source s) {
            Supply supply = result.input().supply();
            String voltage = NumberFormatPolicy.given(supply.lineVoltageV(), "") + "/" + NumberFormatPolicy.given(supply.phaseVoltageV(), "")
                    + " V, " + result.input().basis().earthing().value().token();
            String what;
            if (supply.source() instanceof Supply.Transformer t) {
                what = "transformer " + NumberFormatPolicy.given(t.ratingKva(), "kVA") + ", u_k " + NumberFormatPolicy.given(t.impedancePercent(), "%");
            } else {
                Supply.Utility u = (Supply.Utility) supply.source();
                what = "public supply" + (u.faultLevelKa() != null ? ", I_k " + NumberFormatPolicy.given(u.faultLevelKa(), "kA") : "")
                        + (u.loopImpedanceOhm() != null ? ", Z_e " + NumberFormatPolicy.given(u.loopImpedanceOhm(), Units.OHM) : "");
            }
            float x = box(0);
            float top = s.top();
            String line = "Supply  " + voltage + "  ·  " + what;
            float w = width(label, line) + width(id, "Supply") - width(label, "Supply") + 12;
            g.draw(new Rectangle2D.Float(x, top, w, 16));
            float after = text(g, id, "Supply", x + 6, top + 11);
            text(g, label, "  " + voltage + "  ·  " + what, after, top + 11);
            g.draw(new Line2D.Float(bus(0), top + 16, bus(0), top + SOURCE));
        }

        private void board(Graphics2D g, BoardHead b) {
            float x = box(b.depth());
            float top = b.top();
            if (b.note() != null) {
                g.setColor(QUIET);
                text(g, small, b.note(), x, top + 7);
                g.setColor(INK);
                top += NOTE;
            }
            BoardResult board = b.board();
            String description = board.description() == null ? "" : board.description();
            float idWidth = width(boardFont, board.id());
            float room = WIDTH - FAIL_COLUMN - x - idWidth - 170;
            String desc = fit(label, description, room);
            float w = idWidth + (desc.isEmpty() ? 0 : 6 + width(label, desc)) + 12;
            g.setColor(Color.WHITE);
            g.fill(new Rectangle2D.Float(x, top, w, 16));
            g.setColor(INK);
            g.setStroke(new BasicStroke(1.2f));
            g.draw(new Rectangle2D.Float(x, top, w, 16));
            g.setStroke(new BasicStroke(0.7f));
            float after = text(g, boardFont, board.id(), x + 6, top + 11.2f);
            if (!desc.isEmpty()) text(g, label, desc, after + 6, top + 11);
            String figures = "ΔU " + Labels.percent(board.dropPercent()) + "   I_k max " + NumberFormatPolicy.number(board.faultKa().value(), Units.KA)
                    + " kA   Z_e " + NumberFormatPolicy.number(board.loopImpedance().value(), Units.OHM) + " Ω";
            g.setColor(QUIET);
            text(g, small, figures, x + w + 6, top + 10.5f);
            g.setColor(INK);
            if (!board.pass()) fail(g, top + 11, fails.lines(board.checks(), WIDTH - 200), x + 12, top + 23);
        }

        private void finalCircuit(Graphics2D g, Final f) {
            CircuitResult c = f.circuit();
            float xb = bus(f.depth());
            float line = f.top() + 11;
            g.draw(new Line2D.Float(xb, line, columns.load(), line));
            deviceSymbol(g, xb + 14, line, true);
            float above = line - 3.4f;
            text(g, label, Labels.device(c), xb + 22, above);
            text(g, label, Labels.cable(c), xb + 22 + columns.device() + 8, above);
            g.setColor(QUIET);
            text(g, small, below(c), xb + 22, line + 7.6f);
            g.setColor(INK);
            loadSymbol(g, columns.load(), line);
            float x = columns.load() + 9;
            float after = text(g, id, c.id(), x, line + 2.5f);
            String description = c.circuit().description() == null ? "" : c.circuit().description();
            text(g, label, fit(label, description, WIDTH - FAIL_COLUMN - 6 - after - 5), after + 5, line + 2.5f);
            if (!c.pass()) fail(g, line + 2.5f, fails.lines(c.checks(), fails.room), x, line + 9.8f);
        }

        private String below(CircuitResult c) {
            String drop = "ΔU " + Labels.percent(c.cumulativePercent());
            if (c.limitPercent() != null) drop += " (limit " + Labels.percent(c.limitPercent()) + ")";
            return "I_b " + Labels.amperes(c.designCurrent()) + "   " + drop;
        }

        private void feeder(Graphics2D g, Feeder f) {
            CircuitResult c = f.circuit();
            float xb = bus(f.depth());
            float xc = bus(f.depth() + 1);
            float tap = f.top() + 6;
            float end = f.top() + fails.feeder(c) + (f.elsewhere() ? 4 : 0);
            g.draw(new Line2D.Float(xb, tap, xc, tap));
            g.draw(new Line2D.Float(xc, tap, xc, end));
            deviceSymbol(g, xc, tap + 10, false);
            float x = xc + 9;
            float after = text(g, id, c.id(), x, tap + 9);
            text(g, label, "  " + Labels.device(c) + "   " + Labels.cable(c), after, tap + 9);
            g.setColor(QUIET);
            String drop = "ΔU at " + f.to().id() + " " + Labels.percent(c.cumulativePercent());
            text(g, small, "I_b " + Labels.amperes(c.designCurrent()) + "   " + drop, x, tap + 18);
            g.setColor(INK);
            if (!c.pass()) fail(g, tap + 9, fails.lines(c.checks(), WIDTH - 200), x, tap + 27);
            if (f.elsewhere()) {
                arrowDown(g, xc, end);
                float top = end + 2;
                String to = f.to().id() + (f.to().description() == null ? "" : " " + f.to().description());
                String reference = "continued on diagram sheet " + firstSheet.get(f.to().id());
                float w = width(id, f.to().id()) + width(label, to.substring(f.to().id().length()) + ": " + reference) + 12;
                g.setStroke(new BasicStroke(0.7f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {2.5f, 1.5f}, 0f));
                float x0 = box(f.depth() + 1);
                g.draw(new Rectangle2D.Float(x0, top, w, 13));
                g.setStroke(new BasicStroke(0.7f));
                float a = text(g, id, f.to().id(), x0 + 6, top + 9.3f);
                text(g, label, to.substring(f.to().id().length()) + ": " + reference, a, top + 9.3f);
            }
        }

        private void continues(Graphics2D g, Continues c) {
            float x = bus(0);
            arrowDown(g, x, c.top() + 12);
            g.setColor(QUIET);
            text(g, label, c.board().id() + " continues on diagram sheet " + (number + 1), x + 8, c.top() + 10);
            g.setColor(INK);
        }

        /** The FAIL mark, a cross and the word, in the mark's column; the failing checks' names from (x, first). */
        private void fail(Graphics2D g, float baseline, List<String> names, float x, float first) {
            g.setColor(FAIL);
            text(g, failFont, "× FAIL", WIDTH - FAIL_COLUMN, baseline);
            for (String line : names) {
                text(g, fails.font, line, x, first);
                first += FAIL_LINE;
            }
            g.setColor(INK);
        }

        private void deviceSymbol(Graphics2D g, float cx, float cy, boolean horizontal) {
            float w = horizontal ? 10 : 6;
            float h = horizontal ? 6 : 10;
            Rectangle2D r = new Rectangle2D.Float(cx - w / 2, cy - h / 2, w, h);
            g.setColor(Color.WHITE);
            g.fill(r);
            g.setColor(INK);
            g.draw(r);
            if (horizontal) g.draw(new Line2D.Float(cx - w / 2, cy, cx + w / 2, cy));
            else g.draw(new Line2D.Float(cx, cy - h / 2, cx, cy + h / 2));
        }

        private static void loadSymbol(Graphics2D g, float x, float cy) {
            Path2D.Float p = new Path2D.Float();
            p.moveTo(x, cy - 3.2f);
            p.lineTo(x + 5.5f, cy);
            p.lineTo(x, cy + 3.2f);
            p.closePath();
            g.fill(p);
        }

        private static void arrowDown(Graphics2D g, float x, float y) {
            Path2D.Float p = new Path2D.Float();
            p.moveTo(x - 3, y - 5);
            p.lineTo(x + 3, y - 5);
            p.lineTo(x, y);
            p.closePath();
            g.fill(p);
        }

        private float width(Font f, String text) {
            return Text.width(fonts, f, text);
        }

        /** Draws a text (I_b with its subscript) and returns where it ends. */
        private float text(Graphics2D g, Font f, String text, float x, float baseline) {
            return Text.draw(g, fonts, f, text, x, baseline);
        }

        /** The text, cut with an ellipsis to the width (a description only: ids and figures are never cut). */
        private String fit(Font f, String text, float room) {
            String t = fonts.printable(text);
            if (width(f, t) <= room) return t;
            int n = t.length();
            while (n > 0 && width(f, t.substring(0, n) + "…") > room) n--;
            return n == 0 ? "" : t.substring(0, n).stripTrailing() + "…";
        }
    }
}
