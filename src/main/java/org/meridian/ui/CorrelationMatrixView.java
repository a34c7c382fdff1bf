package org.meridian.ui;

import java.awt.BasicStroke;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import javax.swing.JComponent;
import org.meridian.maps.ColourBar;
import org.meridian.maps.ColourLimits;
import org.meridian.maps.ColourScale;
import org.meridian.span.StabilityTrace;

/**
 * The sample × sample spatial correlation matrix of the window's maps as a heat map (r from −1
 * to +1 on the diverging scale), time running right and down from the window's start; the time
 * cursor marked by a cross. Hovering reads r for the pair of times; clicking moves the cursor.
 */
final class CorrelationMatrixView extends JComponent {
    private final Workbench bench;
    private SpanData data;
    private BufferedImage image;
    /** Everything but the cursor, at device resolution, and what it was drawn for. */
    private BufferedImage layer;
    private Object layerKey;
    private Rectangle2D cells = new Rectangle2D.Double();

    CorrelationMatrixView(Workbench bench) {
        this.bench = bench;
        setName("span.matrix");
        setMinimumSize(new Dimension(120, 120));
        setPreferredSize(new Dimension(220, 200));
        MouseAdapter mouse = new MouseAdapter() {
            @Override
            public void mouseMoved(MouseEvent e) {
                int[] ij = cellAt(e.getX(), e.getY());
                if (ij == null) {
                    bench.pointer("", "", "");
                    return;
                }
                StabilityTrace t = data.trace();
                bench.pointer(Texts.ms(t.timeMs(ij[0])) + " × " + Texts.ms(t.timeMs(ij[1])), "",
                        String.format(java.util.Locale.ROOT, "r = %.3f", t.correlation(ij[0], ij[1])));
            }

            @Override
            public void mousePressed(MouseEvent e) {
                int[] ij = cellAt(e.getX(), e.getY());
                if (ij != null) {
                    bench.state().setCursorMs(data.trace().timeMs(ij[0]));
                }
            }

            @Override
            public void mouseExited(MouseEvent e) {
                bench.pointer("", "", "");
            }
        };
        addMouseListener(mouse);
        addMouseMotionListener(mouse);
        bench.state().addListener((s, what) -> {
            if (what.contains(ViewState.Aspect.CURSOR) || what.contains(ViewState.Aspect.COLOUR_RANGE)) {
                if (what.contains(ViewState.Aspect.COLOUR_RANGE)) {
                    image = null;
                    layer = null;
                }
                repaint();
            }
        });
    }

    void show(SpanData d) {
        data = d;
        image = null;
        layer = null;
        repaint();
    }

    private int[] cellAt(int x, int y) {
        if (data == null || !cells.contains(x, y)) {
            return null;
        }
        int n = data.trace().size();
        int col = (int) ((x - cells.getX()) / cells.getWidth() * n);
        int row = (int) ((y - cells.getY()) / cells.getHeight() * n);
        return new int[] {Math.min(n - 1, row), Math.min(n - 1, col)};
    }

    private BufferedImage image(ColourScale scale) {
        StabilityTrace t = data.trace();
        int n = t.size();
        BufferedImage img = new BufferedImage(n, n, BufferedImage.TYPE_INT_RGB);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double r = t.correlation(i, j);
                img.setRGB(j, i, Double.isNaN(r) ? 0x808080 : scale.rgb((r + 1) / 2));
            }
        }
        return img;
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            double scale = g.getTransform().getScaleX();
            Theme theme = bench.theme();
            Object key = java.util.List.of(getWidth(), getHeight(), scale, theme, bench.state().colourScale());
            if (layer == null || !key.equals(layerKey)) {
                layer = drawLayer(theme, scale);
                layerKey = key;
            }
            g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
            g.drawImage(layer, 0, 0, getWidth(), getHeight(), null);
            if (data == null) {
                return;
            }
            int n = data.trace().size();
            double left = cells.getX();
            double top = cells.getY();
            double side = cells.getWidth();
            int cursor = bench.state().axis().nearestIndex(bench.state().cursorMs()) - data.window().first();
            if (cursor >= 0 && cursor < n) {
                g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                double x = left + (cursor + 0.5) * side / n;
                double y = top + (cursor + 0.5) * side / n;
                g.setColor(theme.cursor());
                g.setStroke(new BasicStroke(1.5f));
                g.draw(new Line2D.Double(x, top, x, top + side));
                g.draw(new Line2D.Double(left, y, left + side, y));
            }
        } finally {
            g.dispose();
        }
    }

    /**
     * Everything but the cursor cross, at device resolution: drawn again only when the size, the
     * screen's scale, the theme, the colour scale or the data change, so a cursor step copies it.
     */
    private BufferedImage drawLayer(Theme theme, double scale) {
        BufferedImage img = new BufferedImage(Math.max(1, (int) Math.ceil(getWidth() * scale)),
                Math.max(1, (int) Math.ceil(getHeight() * scale)), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.scale(scale, scale);
            g.setColor(theme.plotBackground());
            g.fillRect(0, 0, getWidth(), getHeight());
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            if (theme != Theme.LIGHT) {
                g.setColor(theme.mapCard());
                g.fillRoundRect(3, 2, getWidth() - 6, getHeight() - 4, 14, 14);
            }
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            Font font = ChartStyle.tickFont();
            g.setFont(font);
            FontMetrics fm = g.getFontMetrics();
            g.setColor(theme.mapInk());
            String title = "Spatial correlation r";
            g.drawString(title, 6, fm.getAscent() + 2);
            if (data == null) {
                return img;
            }
            double barW = 60;
            double top = fm.getHeight() + 6;
            double left = fm.stringWidth("−000") + 8;
            double side = Math.max(20, Math.min(getWidth() - left - barW - 10, getHeight() - top - fm.getHeight() - 8));
            cells = new Rectangle2D.Double(left, top, side, side);
            if (image == null) {
                image = image(bench.state().colourScale());
            }
            g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
            g.drawImage(image, (int) left, (int) top, (int) side, (int) side, null);
            g.setColor(theme.faint());
            g.draw(cells);
            StabilityTrace t = data.trace();
            g.setColor(theme.mapInk());
            String a = Texts.ms(t.timeMs(0)).replace(" ms", "");
            String b = Texts.ms(t.timeMs(t.size() - 1));
            g.drawString(a, (float) left, (float) (top + side + fm.getAscent() + 2));
            g.drawString(b, (float) (left + side - fm.stringWidth(b)), (float) (top + side + fm.getAscent() + 2));
            g.drawString(a, (float) (left - fm.stringWidth(a) - 4), (float) (top + fm.getAscent()));
            double readable = Math.max(1, ChartStyle.tickFont().getSize2D() / (side * 0.055));
            ColourBar.draw(g, new Rectangle2D.Double(left + side + 6, top, barW, side),
                    bench.state().colourScale(), new ColourLimits(-1, 1), "r", readable);
        } finally {
            g.dispose();
        }
        return img;
    }
}
