package org.meridian.figure;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.meridian.figure.FigureLayout.Placed;
import org.meridian.maps.Drawing;

/**
 * A whole figure drawn onto any {@code Graphics2D} whose unit is the point: every panel at its
 * place from {@link FigureLayout}, from the content computed by {@link FigureContent}. The
 * drawing depends only on the spec and the data, so the window's preview and every export show
 * the same thing, and SVG output is the same bytes wherever it is made. In SVG each panel is a
 * group with id {@code panel-N} (N from 1 in reading order) and class {@code waveform-panel},
 * {@code map-strip}, {@code colour-bar} or {@code span-trace}; the processing caption, when
 * there is one, is the group {@code caption}. Immutable.
 */
public final class FigureDrawing implements Drawing {
    private final FigureContent content;
    private final FigureLayout layout;
    private final FigureStyle style;
    private final Map<Integer, Legend> legends = new HashMap<>();
    private final Map<Integer, Integer> bandLines = new HashMap<>();
    private final WaveScales waveScales;
    private final WaveScales gfpScales;
    private final WaveScales dissScales;

    public FigureDrawing(FigureContent content) {
        this.content = content;
        this.style = FigureStyle.of(content.spec());
        double colourBar = colourBarWidthMm();
        FigureLayout first = FigureLayout.of(content.spec(), style, colourBar, new double[content.spec().rows().size()]);
        placeLegends(first);
        // legend lines below a title take their height from the plots: give it back to the row
        double[] extra = new double[content.spec().rows().size()];
        bandLines.forEach((row, lines) -> extra[row] = (lines - 1) * FigureStyle.lineHeight(style.small())
                / ExportFormat.PT_PER_MM);
        this.layout = FigureLayout.of(content.spec(), style, colourBar, extra);
        WaveScales[] fitted = fitAxes();
        this.waveScales = fitted[0];
        this.gfpScales = fitted[1];
        this.dissScales = fitted[2];
    }

    /** Lays out every waveform and span-trace legend (they depend only on the panels' widths). */
    private void placeLegends(FigureLayout at) {
        String polarityHolder = polarityHolder();
        for (Placed p : at.placed()) {
            PanelContent.Waveforms w = waves(content.panels().get(p.index()));
            if (w != null) {
                String note = ("panel-" + (p.index() + 1)).equals(polarityHolder)
                        ? "(" + content.waveScales().polarity().words() + ")" : null;
                Legend legend = Legend.of(w, p.letter(), note, p.boundsPt().getWidth(), style);
                legends.put(p.index(), legend);
                bandLines.merge(p.row(), legend.bandLines(), Math::max);
            }
        }
    }

    /** The waveform axes as drawn (tick steps fitted to the panels' size), or null. */
    public WaveScales waveScales() {
        return waveScales;
    }

    /** The GFP axes as drawn, or null. */
    public WaveScales gfpScales() {
        return gfpScales;
    }

    /** The DISS axes as drawn, or null. */
    public WaveScales dissScales() {
        return dissScales;
    }

    public FigureLayout layout() {
        return layout;
    }

    public FigureContent content() {
        return content;
    }

    public double widthMm() {
        return layout.widthMm();
    }

    public double heightMm() {
        return layout.heightMm();
    }

    @Override
    public double aspectRatio() {
        return layout.widthMm() / layout.heightMm();
    }

    /** Draws the figure scaled into the bounds (which should have the figure's aspect ratio). */
    @Override
    public void draw(Graphics2D target, Rectangle2D bounds) {
        Graphics2D g = (Graphics2D) target.create();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.translate(bounds.getX(), bounds.getY());
            double widthPt = layout.widthMm() * ExportFormat.PT_PER_MM;
            double heightPt = layout.heightMm() * ExportFormat.PT_PER_MM;
            g.scale(bounds.getWidth() / widthPt, bounds.getHeight() / heightPt);
            drawPanels(g);
            if (!layout.caption().isEmpty()) {
                SvgGroups.begin(g, "caption", "caption");
                Caption.draw(g, FigureLayout.MARGIN_MM * ExportFormat.PT_PER_MM,
                        layout.captionTopMm() * ExportFormat.PT_PER_MM, layout.caption(), style);
                SvgGroups.end(g);
            }
        } finally {
            g.dispose();
        }
    }

    private void drawPanels(Graphics2D g) {
        Map<Integer, Double> mapSide = mapSides();
        Map<Integer, Boolean> rowHasAxisLabel = new HashMap<>();
        float opacity = content.spec().intervals().opacity().floatValue();
        for (Placed p : layout.placed()) {
            Rectangle2D b = p.boundsPt();
            PanelContent c = content.panels().get(p.index());
            String id = "panel-" + (p.index() + 1);
            if (c instanceof PanelContent.Waveforms w) {
                boolean axisLabel = rowHasAxisLabel.putIfAbsent(p.row(), true) == null;
                SvgGroups.begin(g, id, "waveform-panel");
                WaveformPainter.draw(g, b, w, waveScales, style, p.letter(), axisLabel, legends.get(p.index()),
                        bandLines.get(p.row()), opacity);
                SvgGroups.end(g);
            } else if (c instanceof PanelContent.SpanTrace t) {
                SvgGroups.begin(g, id, "span-trace");
                WaveformPainter.draw(g, b, t.asWaveforms(), t.diss() ? dissScales : gfpScales, style, p.letter(), true,
                        legends.get(p.index()), bandLines.get(p.row()), opacity);
                SvgGroups.end(g);
            } else if (c instanceof PanelContent.MapStrip m) {
                SvgGroups.begin(g, id, "map-strip");
                MapStripPainter.draw(g, b, m, content.mapScales(), style, p.letter(), mapSide.get(p.row()), id);
                SvgGroups.end(g);
            } else if (c instanceof PanelContent.ColourBar) {
                SvgGroups.begin(g, id, "colour-bar");
                double side = mapSide.getOrDefault(p.row(), b.getHeight() - FigureLayout.textBands(style)
                        * ExportFormat.PT_PER_MM);
                ColourBarPainter.draw(g, b, content.mapScales(), style, side);
                SvgGroups.end(g);
            }
        }
    }

    private static PanelContent.Waveforms waves(PanelContent c) {
        return c instanceof PanelContent.Waveforms w ? w : c instanceof PanelContent.SpanTrace t ? t.asWaveforms() : null;
    }

    /**
     * The waveform, GFP and DISS axes with tick steps the panels have room for ({@link AxisFit}):
     * amplitude steps from the shortest plot of each kind, one time step for all from the
     * narrowest plot.
     */
    private WaveScales[] fitAxes() {
        WaveScales[] scales = {content.waveScales(), content.gfpScales(), content.dissScales()};
        double[] heights = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        for (Placed p : layout.placed()) {
            int kind = kind(content.panels().get(p.index()));
            if (kind >= 0) {
                heights[kind] = Math.min(heights[kind], WaveformPainter.plotHeight(p.boundsPt(), style,
                        bandLines.get(p.row())));
            }
        }
        var axes = content.spec().waveforms();
        for (int k = 0; k < 3; k++) {
            if (scales[k] != null) {
                boolean fixedStep = k == 0 && axes.amplitudeStep() != null;
                boolean fixedRange = k == 0 ? axes.amplitude() != null : k == 2;
                scales[k] = AxisFit.amplitude(scales[k], fixedStep, fixedRange, k == 1, heights[k], style);
                scales[k] = AxisFit.label(scales[k], heights[k] + 4, style);
            }
        }
        double step = 0;
        for (Placed p : layout.placed()) {
            int kind = kind(content.panels().get(p.index()));
            if (kind >= 0) {
                double width = WaveformPainter.plotWidth(p.boundsPt(), scales[kind], style);
                step = Math.max(step, AxisFit.timeStep(scales[kind], axes.timeStepMs() != null, width, style));
            }
        }
        for (int k = 0; k < 3; k++) {
            scales[k] = scales[k] == null ? null : scales[k].withTimeStep(step);
        }
        return scales;
    }

    /** 0 for a waveform panel, 1 for a GFP trace, 2 for a DISS trace, -1 otherwise. */
    private static int kind(PanelContent c) {
        if (c instanceof PanelContent.Waveforms) {
            return 0;
        }
        return c instanceof PanelContent.SpanTrace t ? (t.diss() ? 2 : 1) : -1;
    }

    /**
     * The least width of the colour bar's panel, in mm, so that its tick labels and its unit fit
     * beside and above the bar as {@code maps.ColourBar} draws them (bar 0.3 font sizes in, 1.3
     * wide, labels 0.55 beyond it); 0 without maps.
     */
    private double colourBarWidthMm() {
        MapScales scales = content.mapScales();
        if (scales == null) {
            return 0;
        }
        java.awt.Font font = style.small();
        double widest = 0;
        for (double tick : scales.limits().ticks()) {
            widest = Math.max(widest, TextMeasure.width(scales.limits().format(tick), font));
        }
        double em = font.getSize2D();
        double pt = Math.max(TextMeasure.width(scales.unitLabel(), font), (0.3 + 1.3 + 0.55) * em + widest) + 1;
        return pt / ExportFormat.PT_PER_MM;
    }

    /** The map side of each row holding map strips: the smallest that every strip of the row fits. */
    private Map<Integer, Double> mapSides() {
        Map<Integer, Double> out = new HashMap<>();
        for (Placed p : layout.placed()) {
            if (content.panels().get(p.index()) instanceof PanelContent.MapStrip m) {
                double side = MapStripPainter.side(p.boundsPt(), m.maps().size(), style);
                out.merge(p.row(), side, Math::min);
            }
        }
        return out;
    }

    /** The panel that states the polarity: the first with a legend, else the first waveform panel. */
    private String polarityHolder() {
        List<PanelContent> panels = content.panels();
        for (int i = 0; i < panels.size(); i++) {
            if (panels.get(i) instanceof PanelContent.Waveforms w && w.legend()) {
                return "panel-" + (i + 1);
            }
        }
        for (int i = 0; i < panels.size(); i++) {
            if (panels.get(i) instanceof PanelContent.Waveforms) {
                return "panel-" + (i + 1);
            }
        }
        return null;
    }
}
