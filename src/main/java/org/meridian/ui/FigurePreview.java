package org.meridian.ui;

import java.awt.Color;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Toolkit;
import java.awt.geom.Rectangle2D;
import javax.swing.JComponent;
import org.meridian.figure.ExportFormat;
import org.meridian.figure.FigureDrawing;

/**
 * The composer's preview: the figure drawn by the same code as every export, at its true size on
 * this screen (its millimetres at the screen's reported resolution) times a zoom factor, on white.
 */
final class FigurePreview extends JComponent {
    private static final long serialVersionUID = 1L;
    private transient FigureDrawing figure;
    private double zoom = 1;

    FigurePreview() {
        setName("figure.preview");
        setOpaque(true);
    }

    void show(FigureDrawing newFigure) {
        figure = newFigure;
        revalidate();
        repaint();
    }

    FigureDrawing figure() {
        return figure;
    }

    void setZoom(double factor) {
        zoom = factor;
        revalidate();
        repaint();
    }

    /** Screen pixels per point at true size and the current zoom. */
    double pixelsPerPoint() {
        return zoom * Toolkit.getDefaultToolkit().getScreenResolution() / 72.0;
    }

    @Override
    public Dimension getPreferredSize() {
        if (figure == null) {
            return new Dimension(400, 200);
        }
        double k = pixelsPerPoint() * ExportFormat.PT_PER_MM;
        return new Dimension((int) Math.ceil(figure.widthMm() * k), (int) Math.ceil(figure.heightMm() * k));
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            g.setColor(getParent() != null ? getParent().getBackground() : Color.LIGHT_GRAY);
            g.fillRect(0, 0, getWidth(), getHeight());
            if (figure == null) {
                return;
            }
            double k = pixelsPerPoint() * ExportFormat.PT_PER_MM;
            Rectangle2D page = new Rectangle2D.Double(0, 0, figure.widthMm() * k, figure.heightMm() * k);
            g.setColor(Color.WHITE);
            g.fill(page);
            figure.draw(g, page);
        } finally {
            g.dispose();
        }
    }
}
