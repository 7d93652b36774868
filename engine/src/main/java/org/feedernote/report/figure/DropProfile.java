package org.feedernote.report.figure;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import org.feedernote.calc.BoardResult;
import org.feedernote.calc.CircuitResult;
import org.feedernote.calc.Result;
import org.feedernote.report.pdf.Figure;
import org.feedernote.report.pdf.FigureFonts;

/**
 * The voltage-drop profile: the drop from the origin against the route length from the origin,
 * one path per board (origin, the boards between, the board, then its final circuit with the
 * largest share of its limit), every final circuit as a dot, each drop limit as a horizontal line,
 * and the worst three paths numbered and named in the legend. Drawn by JFreeChart; the points are
 * the result's drops (a board's drop, each circuit's cumulative drop) and lengths.
 *
 * <p>Length rather than the sequence of boards on the horizontal axis: a checker reads where on
 * the route the drop is spent, and a long final circuit shows as a long last segment.
 */
public final class DropProfile implements Figure {
    /** How many of the worst paths are numbered and named. */
    static final int LABELLED = 3;
    private static final float ASPECT = 0.5f;

    private static final Color[] WORST = {new Color(0x00, 0x00, 0x00), new Color(0x1f, 0x4e, 0x9a), new Color(0x8a, 0x3b, 0x00)};
    private static final float[][] DASHES = {null, {5f, 2.5f}, {1.5f, 1.5f}};
    private static final Color OTHER = new Color(0xa0, 0xa0, 0xa0);
    private static final Color LIMIT = new Color(0xb0, 0x00, 0x00);

    /** One path: its points (route length m, drop %), its name, and how near its end is to its limit. */
    record Path(String name, List<double[]> points, double endDrop, Double limit) {
        double utilisation() {
            return limit == null || limit <= 0 ? 0 : endDrop / limit;
        }
    }

    private final List<Path> paths;
    private final List<double[]> loads;
    private final List<Double> limits;
    private final FigureFonts fonts;

    private DropProfile(List<Path> paths, List<double[]> loads, List<Double> limits, FigureFonts fonts) {
        this.paths = paths;
        this.loads = loads;
        this.limits = limits;
        this.fonts = fonts;
    }

    public static DropProfile of(Result result, FigureFonts fonts) {
        Map<String, BoardResult> boards = new HashMap<>();
        for (BoardResult b : result.boards()) boards.put(b.id(), b);
        Map<String, CircuitResult> circuits = new HashMap<>();
        for (CircuitResult c : result.circuits()) circuits.put(c.id(), c);
        Map<String, Double> distance = new HashMap<>();
        for (BoardResult b : result.boards()) distance(b, boards, circuits, distance);

        List<double[]> loads = new ArrayList<>();
        Map<String, CircuitResult> worstOf = new HashMap<>();
        TreeSet<Double> limits = new TreeSet<>();
        for (CircuitResult c : result.circuits()) {
            if (c.circuit().isFeeder()) continue;
            String from = c.circuit().from();
            if (!distance.containsKey(from)) continue;
            loads.add(new double[] {distance.get(from) + c.length().value(), c.cumulativePercent().value()});
            if (c.limitPercent() != null) limits.add(c.limitPercent().value());
            CircuitResult known = worstOf.get(from);
            if (known == null || share(c) > share(known)) worstOf.put(from, c);
        }
        List<Path> paths = new ArrayList<>();
        for (BoardResult b : result.boards()) {
            if (!distance.containsKey(b.id())) continue;
            List<String> chain = new ArrayList<>();
            for (BoardResult at = b; at != null; at = at.fedBy() == null ? null : boards.get(circuits.get(at.fedBy()).circuit().from())) {
                chain.add(0, at.id());
            }
            List<double[]> points = new ArrayList<>();
            for (String id : chain) points.add(new double[] {distance.get(id), boards.get(id).dropPercent().value()});
            CircuitResult end = worstOf.get(b.id());
            String name = String.join(" → ", chain);
            Double limit = null;
            double endDrop = b.dropPercent().value();
            if (end != null) {
                points.add(new double[] {distance.get(b.id()) + end.length().value(), end.cumulativePercent().value()});
                name += " → " + end.id();
                endDrop = end.cumulativePercent().value();
                limit = end.limitPercent() == null ? null : end.limitPercent().value();
            }
            paths.add(new Path(name, List.copyOf(points), endDrop, limit));
        }
        return new DropProfile(List.copyOf(paths), List.copyOf(loads), List.copyOf(limits), fonts);
    }

    /** A circuit's drop as a share of its limit (its drop where it has no limit, ranked after). */
    private static double share(CircuitResult c) {
        double drop = c.cumulativePercent().value();
        return c.limitPercent() == null || c.limitPercent().value() <= 0 ? drop / 1000 : drop / c.limitPercent().value();
    }

    /** The route length from the origin to a board: the lengths of the feeders above it. */
    private static Double distance(BoardResult b, Map<String, BoardResult> boards, Map<String, CircuitResult> circuits,
                                   Map<String, Double> known) {
        if (known.containsKey(b.id())) return known.get(b.id());
        known.put(b.id(), null);
        Double d;
        if (b.fedBy() == null) {
            d = 0.0;
        } else {
            CircuitResult feeder = circuits.get(b.fedBy());
            BoardResult above = feeder == null ? null : boards.get(feeder.circuit().from());
            Double up = above == null ? null : distance(above, boards, circuits, known);
            d = up == null ? null : up + feeder.length().value();
        }
        if (d == null) known.remove(b.id());
        else known.put(b.id(), d);
        return d;
    }

    /** The labelled paths: the worst by share of the limit, then by drop, then by name. */
    List<Path> worst() {
        List<Path> sorted = new ArrayList<>(paths);
        sorted.sort(Comparator.comparingDouble(Path::utilisation).reversed()
                .thenComparing(Comparator.comparingDouble(Path::endDrop).reversed()).thenComparing(Path::name));
        return sorted.subList(0, Math.min(LABELLED, sorted.size()));
    }

    @Override public float height(float width) {
        return width * ASPECT;
    }

    @Override public void draw(Graphics2D g, float width, float height) {
        JFreeChart chart = chart();
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
    }

    private JFreeChart chart() {
        Font tick = fonts.regular(7f);
        Font axisLabel = fonts.regular(8f);
        Font legend = fonts.regular(7f);
        List<Path> worst = worst();
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, true);
        int series = 0;
        // Others first, in the order of the boards, so the labelled paths are drawn over them.
        for (Path p : paths) {
            if (worst.contains(p)) continue;
            data.addSeries(series(p.name(), p.points()));
            renderer.setSeriesPaint(series, OTHER);
            renderer.setSeriesStroke(series, new BasicStroke(0.6f));
            renderer.setSeriesShape(series, new Ellipse2D.Double(-1.2, -1.2, 2.4, 2.4));
            renderer.setSeriesVisibleInLegend(series, series == 0);
            series++;
        }
        int others = series;
        XYSeries dots = new XYSeries("final circuits", false, true);
        for (double[] l : loads) dots.add(l[0], l[1]);
        data.addSeries(dots);
        renderer.setSeriesLinesVisible(series, false);
        renderer.setSeriesPaint(series, OTHER);
        renderer.setSeriesShape(series, new Ellipse2D.Double(-1.4, -1.4, 2.8, 2.8));
        series++;
        for (int k = 0; k < worst.size(); k++) {
            Path p = worst.get(k);
            String limit = p.limit() == null ? "" : " (limit " + pct(p.limit()) + ")";
            data.addSeries(series((k + 1) + "  " + p.name() + ": " + pct(p.endDrop()) + limit, p.points()));
            renderer.setSeriesPaint(series, WORST[k]);
            renderer.setSeriesStroke(series, DASHES[k] == null ? new BasicStroke(1.4f)
                    : new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, DASHES[k], 0f));
            renderer.setSeriesShape(series, new Rectangle2D.Double(-2, -2, 4, 4));
            series++;
        }
        renderer.setDefaultItemLabelsVisible(false);

        NumberAxis x = new NumberAxis("Route length from the origin (m)");
        NumberAxis y = new NumberAxis("Voltage drop from the origin (%)");
        for (NumberAxis a : new NumberAxis[] {x, y}) {
            a.setStandardTickUnits(NumberAxis.createStandardTickUnits(Locale.ROOT));
            a.setLabelFont(axisLabel);
            a.setTickLabelFont(tick);
            a.setLabelPaint(Color.BLACK);
            a.setTickLabelPaint(Color.BLACK);
            a.setAxisLinePaint(Color.BLACK);
            a.setTickMarkPaint(Color.BLACK);
            a.setAutoRangeIncludesZero(true);
        }
        y.setNumberFormatOverride(new DecimalFormat("0.0#", DecimalFormatSymbols.getInstance(Locale.ROOT)));
        double top = 0;
        for (Path p : paths) for (double[] pt : p.points()) top = Math.max(top, pt[1]);
        for (double[] l : loads) top = Math.max(top, l[1]);
        for (double l : limits) top = Math.max(top, l);
        y.setRange(0, top <= 0 ? 1 : top * 1.12);
        double right = 0;
        for (double[] l : loads) right = Math.max(right, l[0]);
        for (Path p : paths) for (double[] pt : p.points()) right = Math.max(right, pt[0]);
        x.setRange(0, right <= 0 ? 1 : right * 1.06);

        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlinePaint(Color.BLACK);
        plot.setDomainGridlinePaint(new Color(0xd8, 0xd8, 0xd8));
        plot.setRangeGridlinePaint(new Color(0xd8, 0xd8, 0xd8));
        plot.setDomainGridlineStroke(new BasicStroke(0.4f));
        plot.setRangeGridlineStroke(new BasicStroke(0.4f));
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        for (Double limit : limits) {
            ValueMarker m = new ValueMarker(limit, LIMIT, new BasicStroke(1.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    new float[] {6f, 3f}, 0f));
            m.setLabel("limit " + pct(limit));
            m.setLabelFont(fonts.bold(7f));
            m.setLabelPaint(LIMIT);
            // At the left, where the paths begin near zero: clear of the labelled ends.
            m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            m.setLabelOffset(new RectangleInsets(2, 4, 2, 2));
            m.setLabelBackgroundColor(Color.WHITE);
            plot.addRangeMarker(m);
        }
        for (int k = 0; k < worst.size(); k++) {
            List<double[]> pts = worst.get(k).points();
            double[] end = pts.get(pts.size() - 1);
            XYTextAnnotation a = new XYTextAnnotation(Integer.toString(k + 1), end[0], end[1]);
            a.setFont(fonts.bold(7.5f));
            a.setPaint(WORST[k]);
            a.setTextAnchor(TextAnchor.BOTTOM_LEFT);
            a.setX(end[0] + right * 0.008);
            a.setY(end[1] + (top <= 0 ? 1 : top) * 0.015);
            plot.addAnnotation(a);
        }

        JFreeChart chart = new JFreeChart(null, fonts.bold(9f), plot, true);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(false);
        chart.setTextAntiAlias(false);
        chart.setPadding(new RectangleInsets(2, 2, 2, 8));
        LegendTitle l = chart.getLegend();
        l.setItemFont(legend);
        l.setPosition(RectangleEdge.BOTTOM);
        l.setFrame(BlockBorder.NONE);
        l.setBackgroundPaint(Color.WHITE);
        l.setItemLabelPadding(new RectangleInsets(1, 3, 1, 8));
        if (others == 0) renderer.setSeriesVisibleInLegend(0, true);
        relabelOthers(data, others);
        return chart;
    }

    /** The first of the other paths stands for all of them in the legend. */
    private static void relabelOthers(XYSeriesCollection data, int others) {
        if (others > 0) data.getSeries(0).setKey("other boards' paths");
    }

    private static XYSeries series(String key, List<double[]> points) {
        XYSeries s = new XYSeries(key, false, true);
        for (double[] p : points) s.add(p[0], p[1]);
        return s;
    }

    private static String pct(double value) {
        return org.feedernote.report.NumberFormatPolicy.number(value, org.feedernote.formula.Units.PERCENT) + " %";
    }
}
