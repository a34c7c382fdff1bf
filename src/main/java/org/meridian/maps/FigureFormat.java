package org.meridian.maps;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.jfree.pdf.PDFDocument;
import org.jfree.pdf.PDFGraphics2D;
import org.jfree.pdf.Page;
import org.jfree.svg.SVGGraphics2D;
import org.meridian.core.BadInputException;
import org.meridian.io.AtomicFiles;

/**
 * The file formats a {@link Drawing} is written to, chosen by the file's extension: SVG
 * (JFreeSVG) and PDF (OrsonPDF) as vectors sized in points, PNG (ImageIO) as pixels at a given
 * resolution on a white background. Every file is written through {@link AtomicFiles}.
 */
public enum FigureFormat {
    SVG, PDF, PNG;

    /** The format of a file name's extension, or a {@link BadInputException} naming the file. */
    public static FigureFormat of(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".svg")) {
            return SVG;
        }
        if (name.endsWith(".pdf")) {
            return PDF;
        }
        if (name.endsWith(".png")) {
            return PNG;
        }
        throw new BadInputException(file + ": the figure must be a .svg, .pdf or .png file");
    }

    /**
     * Writes the drawing to a file of this format.
     *
     * @param widthPt  the width in points (1/72 inch); the height follows the drawing's aspect
     * @param dpi      pixels per inch for PNG (ignored by the vector formats)
     */
    public void write(Drawing drawing, Path file, double widthPt, int dpi) {
        if (!(widthPt > 0) || dpi < 10 || dpi > 2400) {
            throw new BadInputException("figure size must be positive and 10–2400 dpi, got "
                    + widthPt + " pt at " + dpi + " dpi");
        }
        double heightPt = widthPt / drawing.aspectRatio();
        switch (this) {
            case SVG -> {
                SVGGraphics2D g = new SVGGraphics2D(widthPt, heightPt);
                drawOnWhite(g, drawing, widthPt, heightPt);
                String svg = g.getSVGDocument();
                AtomicFiles.write(file, out -> out.write(svg.getBytes(StandardCharsets.UTF_8)));
            }
            case PDF -> {
                PDFDocument doc = new PDFDocument();
                doc.setTitle(file.getFileName().toString());
                Page page = doc.createPage(new Rectangle2D.Double(0, 0, widthPt, heightPt));
                PDFGraphics2D g = page.getGraphics2D();
                drawOnWhite(g, drawing, widthPt, heightPt);
                byte[] bytes = doc.getPDFBytes();
                AtomicFiles.write(file, out -> out.write(bytes));
            }
            case PNG -> {
                double scale = dpi / 72.0;
                int w = (int) Math.ceil(widthPt * scale);
                int h = (int) Math.ceil(heightPt * scale);
                BufferedImage image = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
                Graphics2D g = image.createGraphics();
                try {
                    g.scale(scale, scale);
                    drawOnWhite(g, drawing, widthPt, heightPt);
                } finally {
                    g.dispose();
                }
                AtomicFiles.write(file, out -> {
                    if (!ImageIO.write(image, "png", out)) {
                        throw new java.io.IOException("no PNG writer available");
                    }
                });
            }
            default -> throw new AssertionError(this);
        }
    }

    private static void drawOnWhite(Graphics2D g, Drawing drawing, double w, double h) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fill(new Rectangle2D.Double(0, 0, w, h));
        drawing.draw(g, new Rectangle2D.Double(0, 0, w, h));
    }
}
