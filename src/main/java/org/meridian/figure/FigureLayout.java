package org.meridian.figure;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.meridian.figure.spec.ColourBarPanel;
import org.meridian.figure.spec.FigureSpec;
import org.meridian.figure.spec.MapStripPanel;
import org.meridian.figure.spec.PanelRow;
import org.meridian.figure.spec.PanelSpec;
import org.meridian.figure.spec.SpanTracePanel;
import org.meridian.figure.spec.WaveformPanel;

/**
 * Where every panel of a figure goes, in millimetres from the top-left corner. Rows run top to
 * bottom with {@value #GAP_MM} mm between them, panels left to right with {@value #GAP_MM} mm
 * between them, each panel's width in proportion to its {@code width} share, inside a margin of
 * {@value #MARGIN_MM} mm. A row's height is its {@code height_mm}, or else its natural height:
 * the tallest of its panels' — a waveform or span-trace panel 0.75 × its width (30–60 mm), a map strip its
 * maps' side plus a title line and a time line, a colour bar alone 30 mm. When the spec fixes the
 * figure's height, the rows are scaled to fill it. Panels are lettered A, B, C … in reading
 * order (colour bars excepted). When the spec processes the data, a caption saying how
 * ({@link Caption}) runs under the rows, wrapped to the figure's width. Immutable.
 */
public final class FigureLayout {
    public static final double MARGIN_MM = 1;
    public static final double GAP_MM = 3;
    /** Gap between the maps of a strip. */
    public static final double MAP_GAP_MM = 1.5;
    private static final double PT_TO_MM = 25.4 / 72;
    /** Space between the last row and the caption. */
    private static final double CAPTION_GAP_MM = 1.5;

    /** One panel at its place. */
    public record Placed(PanelSpec panel, int index, int row, Rectangle2D boundsMm, String letter) {
        /** The bounds in points, the unit the drawing works in. */
        public Rectangle2D boundsPt() {
            double k = ExportFormat.PT_PER_MM;
            return new Rectangle2D.Double(boundsMm.getX() * k, boundsMm.getY() * k,
                    boundsMm.getWidth() * k, boundsMm.getHeight() * k);
        }
    }

    private final double widthMm;
    private final double heightMm;
    private final List<Placed> placed;
    private final List<String> caption;
    private final double captionTopMm;

    private FigureLayout(double widthMm, double heightMm, List<Placed> placed, List<String> caption,
            double captionTopMm) {
        this.widthMm = widthMm;
        this.heightMm = heightMm;
        this.placed = List.copyOf(placed);
        this.caption = List.copyOf(caption);
        this.captionTopMm = captionTopMm;
    }

    public static FigureLayout of(FigureSpec spec, FigureStyle style) {
        return of(spec, style, 0, new double[spec.rows().size()]);
    }

    /**
     * @param colourBarMm the least width a colour bar panel needs for its labels (mm); its
     *                    neighbours in the row give up the difference
     * @param extraMm     per row, height to add to its natural height (e.g. for legend lines
     *                    that take room from the plots); rows with a fixed height ignore it
     */
    public static FigureLayout of(FigureSpec spec, FigureStyle style, double colourBarMm, double[] extraMm) {
        double width = spec.size().width().mm();
        double inner = width - 2 * MARGIN_MM;
        List<double[]> widths = new ArrayList<>();
        double[] heights = new double[spec.rows().size()];
        double natural = 0;
        for (int r = 0; r < heights.length; r++) {
            PanelRow row = spec.rows().get(r);
            double[] w = panelWidths(row, inner, colourBarMm);
            widths.add(w);
            double h = row.heightMm() != null ? row.heightMm() : naturalHeight(row, w, style) + extraMm[r];
            heights[r] = h;
            natural += h;
        }
        List<String> caption = Caption.wrap(Caption.text(spec), style.small(), inner / PT_TO_MM);
        double captionMm = caption.isEmpty() ? 0
                : CAPTION_GAP_MM + caption.size() * FigureStyle.lineHeight(style.small()) * PT_TO_MM;
        double rowsSpace = spec.size().heightMm() != null
                ? spec.size().heightMm() - 2 * MARGIN_MM - GAP_MM * (heights.length - 1) - captionMm : natural;
        if (!(rowsSpace > heights.length * 5)) {
            throw new org.meridian.core.BadInputException("size.height_mm " + spec.size().heightMm()
                    + " leaves less than 5 mm for each of the " + heights.length + " rows");
        }
        double scale = rowsSpace / natural;
        List<Placed> out = new ArrayList<>();
        double y = MARGIN_MM;
        int index = 0;
        int letter = 0;
        for (int r = 0; r < heights.length; r++) {
            double h = heights[r] * scale;
            double x = MARGIN_MM;
            List<PanelSpec> panels = spec.rows().get(r).panels();
            for (int p = 0; p < panels.size(); p++) {
                PanelSpec panel = panels.get(p);
                double w = widths.get(r)[p];
                String name = spec.letters() && panel.lettered() ? letterName(letter++) : "";
                out.add(new Placed(panel, index++, r, new Rectangle2D.Double(x, y, w, h), name));
                x += w + GAP_MM;
            }
            y += h + GAP_MM;
        }
        double captionTop = y - GAP_MM + CAPTION_GAP_MM;
        double height = y - GAP_MM + captionMm + MARGIN_MM;
        return new FigureLayout(width, height, out, caption, captionTop);
    }

    public double widthMm() {
        return widthMm;
    }

    public double heightMm() {
        return heightMm;
    }

    public List<Placed> placed() {
        return placed;
    }

    /** The caption's lines under the panels (none when the data are shown as loaded). */
    public List<String> caption() {
        return caption;
    }

    /** The top of the caption's first line, in mm from the top. */
    public double captionTopMm() {
        return captionTopMm;
    }

    private static double[] panelWidths(PanelRow row, double inner, double colourBarMm) {
        List<PanelSpec> panels = row.panels();
        double share = 0;
        for (PanelSpec p : panels) {
            share += p.width();
        }
        double free = inner - GAP_MM * (panels.size() - 1);
        if (free < 5 * panels.size()) {
            throw new org.meridian.core.BadInputException("a row of " + panels.size()
                    + " panels does not fit the figure's width");
        }
        double[] w = new double[panels.size()];
        double barsExtra = 0;
        double othersShare = 0;
        for (int i = 0; i < w.length; i++) {
            w[i] = free * panels.get(i).width() / share;
            if (panels.get(i) instanceof ColourBarPanel && w[i] < colourBarMm) {
                barsExtra += colourBarMm - w[i];
                w[i] = colourBarMm;
            } else {
                othersShare += panels.get(i).width();
            }
        }
        if (barsExtra > 0 && othersShare > 0) {
            for (int i = 0; i < w.length; i++) {
                if (!(panels.get(i) instanceof ColourBarPanel && w[i] == colourBarMm)) {
                    w[i] -= barsExtra * panels.get(i).width() / othersShare;
                }
            }
        }
        return w;
    }

    private static double naturalHeight(PanelRow row, double[] widths, FigureStyle style) {
        double h = 0;
        for (int i = 0; i < widths.length; i++) {
            PanelSpec p = row.panels().get(i);
            if (p instanceof WaveformPanel || p instanceof SpanTracePanel) {
                h = Math.max(h, Math.max(30, Math.min(60, 0.75 * widths[i])));
            } else if (p instanceof MapStripPanel m) {
                h = Math.max(h, mapSide(widths[i], m.mapCount()) + textBands(style));
            }
        }
        if (h == 0 && row.panels().stream().allMatch(p -> p instanceof ColourBarPanel)) {
            h = 30;
        }
        return h;
    }

    /** The side of each map of a strip in a panel of a given width (mm). */
    static double mapSide(double widthMm, int maps) {
        return (widthMm - MAP_GAP_MM * (maps - 1)) / maps;
    }

    /** The title band above and the time band below a map strip, in mm. */
    static double textBands(FigureStyle style) {
        return (FigureStyle.lineHeight(style.letter()) + FigureStyle.lineHeight(style.small()) * 1.1) * PT_TO_MM;
    }

    private static String letterName(int i) {
        return i < 26 ? String.valueOf((char) ('A' + i)) : letterName(i / 26 - 1) + (char) ('A' + i % 26);
    }
}
