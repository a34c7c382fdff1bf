package org.meridian.ui;

import java.awt.Color;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.GraphicsConfiguration;
import java.awt.RenderingHints;
import java.awt.Toolkit;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import javax.swing.JComponent;
import org.meridian.figure.ExportFormat;
import org.meridian.figure.FigureDrawing;

/**
 * The composer's preview: the figure drawn by the same code as every export, at its true size on
 * this screen (its millimetres at the screen's reported resolution) times a zoom factor, on white.
 * The figure is rendered into an image off the event thread ({@link #render}, at the screen's
 * device scale so it is sharp on high-density screens); painting only copies that image, so
 * scrolling, exposing or resizing the dialog never redraws waves and maps. While a new zoom's
 * image is on its way, the last image is shown stretched.
 */
final class FigurePreview extends JComponent {
    private static final long serialVersionUID = 1L;
    private transient FigureDrawing figure;
    private transient BufferedImage image;
    private double zoom = 1;

    /** A rendered preview: the figure and its image at a number of device pixels per point. */
    record Rendered(FigureDrawing figure, BufferedImage image) {
    }

    FigurePreview() {
        setName("figure.preview");
        setOpaque(true);
    }

    /** Shows a figure rendered by {@link #render}; called on the event thread. */
    void show(Rendered rendered) {
        figure = rendered.figure();
        image = rendered.image();
        revalidate();
        repaint();
    }

    FigureDrawing figure() {
        return figure;
    }

    /** The image being shown, or null before the first preview. */
    BufferedImage image() {
        return image;
    }

    void setZoom(double factor) {
        zoom = factor;
        revalidate();
        repaint();
    }

    /** Screen pixels per point at true size and the current zoom (in the screen's logical pixels). */
    double pixelsPerPoint() {
        return zoom * Toolkit.getDefaultToolkit().getScreenResolution() / 72.0;
    }

    /** Device pixels per point: {@link #pixelsPerPoint()} times the screen's scale (2 on many HiDPI screens). */
    double devicePixelsPerPoint() {
        GraphicsConfiguration gc = getGraphicsConfiguration();
        double scale = gc == null ? 1 : gc.getDefaultTransform().getScaleX();
        return pixelsPerPoint() * scale;
    }

    /** Draws a figure into a white image at a number of pixels per point; safe off the event thread. */
    static Rendered render(FigureDrawing figure, double pixelsPerPoint) {
        double k = pixelsPerPoint * ExportFormat.PT_PER_MM;
        int w = Math.max(1, (int) Math.ceil(figure.widthMm() * k));
        int h = Math.max(1, (int) Math.ceil(figure.heightMm() * k));
        BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = out.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, w, h);
            figure.draw(g, new Rectangle2D.Double(0, 0, figure.widthMm() * k, figure.heightMm() * k));
        } finally {
            g.dispose();
        }
        return new Rendered(figure, out);
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
            if (figure == null || image == null) {
                return;
            }
            double k = pixelsPerPoint() * ExportFormat.PT_PER_MM;
            g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
            // logical size: on a scaled screen the image's extra pixels become the device's pixels
            g.drawImage(image, 0, 0, (int) Math.ceil(figure.widthMm() * k), (int) Math.ceil(figure.heightMm() * k), null);
        } finally {
            g.dispose();
        }
    }
}
