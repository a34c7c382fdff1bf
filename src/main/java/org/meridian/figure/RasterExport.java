package org.meridian.figure;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Path;
import java.util.Iterator;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOInvalidTreeException;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.plugins.tiff.BaselineTIFFTagSet;
import javax.imageio.plugins.tiff.TIFFDirectory;
import javax.imageio.plugins.tiff.TIFFField;
import javax.imageio.plugins.tiff.TIFFTag;
import javax.imageio.stream.ImageOutputStream;
import org.meridian.io.AtomicFiles;
import org.meridian.maps.Drawing;

/**
 * PNG and TIFF through ImageIO (Java's own writers). The image is
 * round(mm / 25.4 × dpi) pixels on each side, RGB on white, and carries its resolution: the PNG
 * pHYs chunk in pixels per metre (PNG specification, 11.3.5.3) and the TIFF XResolution,
 * YResolution and ResolutionUnit = inch tags (TIFF 6.0, section 8), so layout programs place it
 * at its physical size. TIFF is compressed losslessly (Deflate).
 */
public final class RasterExport {
    private static final double MM_PER_INCH = 25.4;

    private RasterExport() {
    }

    /** Pixels for a length in mm at a resolution. */
    public static int pixels(double mm, int dpi) {
        return (int) Math.round(mm / MM_PER_INCH * dpi);
    }

    /** The drawing rendered into an image of the given physical size and resolution. */
    public static BufferedImage render(Drawing drawing, double widthMm, double heightMm, int dpi) {
        int w = pixels(widthMm, dpi);
        int h = pixels(heightMm, dpi);
        BufferedImage image = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, w, h);
            g.scale(w / (widthMm * ExportFormat.PT_PER_MM), h / (heightMm * ExportFormat.PT_PER_MM));
            drawing.draw(g, new Rectangle2D.Double(0, 0, widthMm * ExportFormat.PT_PER_MM,
                    heightMm * ExportFormat.PT_PER_MM));
        } finally {
            g.dispose();
        }
        return image;
    }

    static void write(Drawing drawing, Path file, double widthMm, double heightMm, int dpi, ExportFormat format) {
        BufferedImage image = render(drawing, widthMm, heightMm, dpi);
        AtomicFiles.write(file, out -> write(image, dpi, format, out));
    }

    /** Writes an image with its resolution stored, as PNG or TIFF. */
    public static void write(BufferedImage image, int dpi, ExportFormat format, OutputStream out) throws IOException {
        String name = format == ExportFormat.PNG ? "png" : "tiff";
        Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName(name);
        if (!writers.hasNext()) {
            throw new IOException("this Java has no " + name.toUpperCase(java.util.Locale.ROOT) + " writer");
        }
        ImageWriter writer = writers.next();
        try (ImageOutputStream stream = ImageIO.createImageOutputStream(out)) {
            ImageWriteParam param = writer.getDefaultWriteParam();
            IIOMetadata metadata;
            if (format == ExportFormat.PNG) {
                metadata = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(image), param);
                addPhysicalSize(metadata, dpi);
            } else {
                param.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
                param.setCompressionType("Deflate");
                metadata = tiffResolution(writer.getDefaultImageMetadata(
                        ImageTypeSpecifier.createFromRenderedImage(image), param), dpi);
            }
            writer.setOutput(stream);
            writer.write(null, new IIOImage(image, null, metadata), param);
        } finally {
            writer.dispose();
        }
    }

    private static void addPhysicalSize(IIOMetadata metadata, int dpi) throws IIOInvalidTreeException {
        String perMetre = Long.toString(Math.round(dpi / (MM_PER_INCH / 1000)));
        IIOMetadataNode phys = new IIOMetadataNode("pHYs");
        phys.setAttribute("pixelsPerUnitXAxis", perMetre);
        phys.setAttribute("pixelsPerUnitYAxis", perMetre);
        phys.setAttribute("unitSpecifier", "meter");
        IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
        root.appendChild(phys);
        metadata.mergeTree("javax_imageio_png_1.0", root);
    }

    private static IIOMetadata tiffResolution(IIOMetadata metadata, int dpi) throws IIOInvalidTreeException {
        TIFFDirectory dir = TIFFDirectory.createFromMetadata(metadata);
        BaselineTIFFTagSet base = BaselineTIFFTagSet.getInstance();
        long[][] perInch = {{dpi, 1}};
        dir.addTIFFField(new TIFFField(base.getTag(BaselineTIFFTagSet.TAG_X_RESOLUTION),
                TIFFTag.TIFF_RATIONAL, 1, perInch));
        dir.addTIFFField(new TIFFField(base.getTag(BaselineTIFFTagSet.TAG_Y_RESOLUTION),
                TIFFTag.TIFF_RATIONAL, 1, perInch));
        dir.addTIFFField(new TIFFField(base.getTag(BaselineTIFFTagSet.TAG_RESOLUTION_UNIT),
                BaselineTIFFTagSet.RESOLUTION_UNIT_INCH));
        return dir.getAsMetadata();
    }
}
