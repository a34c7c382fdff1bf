package org.meridian.figure;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * A waveform panel's legend — a short line in each wave's colour and dash with its name, then
 * the polarity note where the panel carries it — right-aligned in the panel. It sits on the
 * title's line when it fits beside the letter and title; otherwise it takes lines of its own
 * below the title, as many as it needs, wrapping between entries so it never leaves its panel.
 * Widths come from {@link TextMeasure}, so the layout does not depend on the drawing surface.
 */
final class Legend {
    private static final double LINE_PT = 10;

    /** One entry: a wave (with its trace) or the note (trace null). */
    private record Entry(WaveTrace trace, String text, double width) {
    }

    private final List<List<Entry>> rows;
    private final boolean besideTitle;
    private final FigureStyle style;

    private Legend(List<List<Entry>> rows, boolean besideTitle, FigureStyle style) {
        this.rows = rows;
        this.besideTitle = besideTitle;
        this.style = style;
    }

    /** Lays out a panel's legend for a panel of the given width with the given letter and title. */
    static Legend of(PanelContent.Waveforms panel, String letter, String note, double widthPt, FigureStyle style) {
        Font font = style.small();
        List<Entry> entries = new ArrayList<>();
        if (panel.legend()) {
            for (WaveTrace t : panel.traces()) {
                entries.add(new Entry(t, t.label(), LINE_PT + gap(style) + TextMeasure.width(t.label(), font)));
            }
        }
        if (note != null) {
            entries.add(new Entry(null, note, TextMeasure.width(note, font)));
        }
        if (entries.isEmpty()) {
            return new Legend(List.of(), true, style);
        }
        double title = TextMeasure.width(letter, style.letter()) + style.letter().getSize2D()
                + TextMeasure.width(panel.title(), style.label());
        if (title + width(entries, style) + font.getSize2D() <= widthPt) {
            return new Legend(List.of(entries), true, style);
        }
        List<List<Entry>> rows = new ArrayList<>();
        List<Entry> row = new ArrayList<>();
        for (Entry e : entries) {
            List<Entry> longer = new ArrayList<>(row);
            longer.add(e);
            if (!row.isEmpty() && width(longer, style) > widthPt) {
                rows.add(row);
                row = new ArrayList<>();
            }
            row.add(e);
        }
        rows.add(row);
        return new Legend(rows, false, style);
    }

    /** Lines of text the panel's top band takes: 1 with the legend beside the title, else 1 + its rows. */
    int bandLines() {
        return besideTitle ? 1 : 1 + rows.size();
    }

    /** Draws the legend in the top band of a panel's bounds. */
    void draw(Graphics2D target, Rectangle2D bounds) {
        if (rows.isEmpty()) {
            return;
        }
        Graphics2D g = (Graphics2D) target.create();
        try {
            Font font = style.small();
            g.setFont(font);
            double lineHeight = FigureStyle.lineHeight(font);
            for (int r = 0; r < rows.size(); r++) {
                double baseline = bounds.getY() + (besideTitle ? TitleBand.baseline(style)
                        : TitleBand.height(style) + font.getSize2D() + r * lineHeight);
                List<Entry> row = rows.get(r);
                double x = bounds.getMaxX() - width(row, style);
                double lineY = baseline - font.getSize2D() * 0.3;
                for (Entry e : row) {
                    if (e.trace() != null) {
                        g.setColor(e.trace().colour());
                        g.setStroke(style.waveStroke(e.trace().dashed()));
                        g.draw(new Line2D.Double(x, lineY, x + LINE_PT, lineY));
                        g.setColor(FigureStyle.INK);
                        g.drawString(e.text(), (float) (x + LINE_PT + gap(style)), (float) baseline);
                    } else {
                        g.setColor(FigureStyle.INK);
                        g.drawString(e.text(), (float) x, (float) baseline);
                    }
                    x += e.width() + spacing(style);
                }
            }
        } finally {
            g.dispose();
        }
    }

    private static double width(List<Entry> row, FigureStyle style) {
        double w = 0;
        for (Entry e : row) {
            w += e.width();
        }
        return w + spacing(style) * Math.max(0, row.size() - 1);
    }

    private static double gap(FigureStyle style) {
        return style.small().getSize2D() * 0.35;
    }

    private static double spacing(FigureStyle style) {
        return style.small().getSize2D() * 1.1;
    }
}
