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
 * {@code map-strip}, {@code colour-bar} or {@code span-trace}. Immutable.
 */
public final class FigureDrawing implements Drawing {
    private final FigureContent content;
    private final FigureLayout layout;
    private final FigureStyle style;

    public FigureDrawing(FigureContent content) {
        this.content = content;
        this.style = FigureStyle.of(content.spec());
        this.layout = FigureLayout.of(content.spec(), style);
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
        } finally {
            g.dispose();
        }
    }

    private void drawPanels(Graphics2D g) {
        Map<Integer, Double> mapSide = mapSides();
        String polarityHolder = polarityHolder();
        Map<Integer, Boolean> rowHasAxisLabel = new HashMap<>();
        Map<Integer, Integer> legendLines = legendLines(g, polarityHolder);
        for (Placed p : layout.placed()) {
            Rectangle2D b = p.boundsPt();
            PanelContent c = content.panels().get(p.index());
            String id = "panel-" + (p.index() + 1);
            if (c instanceof PanelContent.Waveforms w) {
                boolean axisLabel = rowHasAxisLabel.putIfAbsent(p.row(), true) == null;
                String note = id.equals(polarityHolder) ? "(" + content.waveScales().polarity().words() + ")" : null;
                SvgGroups.begin(g, id, "waveform-panel");
                WaveformPainter.draw(g, b, w, content.waveScales(), style, p.letter(), axisLabel, note,
                        legendLines.get(p.row()), content.spec().intervals().opacity().floatValue());
                SvgGroups.end(g);
            } else if (c instanceof PanelContent.SpanTrace t) {
                SvgGroups.begin(g, id, "span-trace");
                WaveformPainter.draw(g, b, t.asWaveforms(), content.gfpScales(), style, p.letter(), true, null,
                        legendLines.getOrDefault(p.row(), 1), content.spec().intervals().opacity().floatValue());
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

    /** Per row of waveform panels: 2 when some legend of the row needs a line of its own, else 1. */
    private Map<Integer, Integer> legendLines(Graphics2D g, String polarityHolder) {
        Map<Integer, Integer> out = new HashMap<>();
        for (Placed p : layout.placed()) {
            PanelContent c = content.panels().get(p.index());
            PanelContent.Waveforms w = c instanceof PanelContent.Waveforms waves ? waves
                    : c instanceof PanelContent.SpanTrace t ? t.asWaveforms() : null;
            if (w != null) {
                String id = "panel-" + (p.index() + 1);
                String note = id.equals(polarityHolder) ? "(" + content.waveScales().polarity().words() + ")" : null;
                int lines = WaveformPainter.legendFitsBesideTitle(g, p.boundsPt(), w, p.letter(), note, style) ? 1 : 2;
                out.merge(p.row(), lines, Math::max);
            }
        }
        return out;
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
