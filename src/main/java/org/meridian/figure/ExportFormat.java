package org.meridian.figure;

import java.nio.file.Path;
import java.util.Locale;
import org.meridian.core.BadInputException;
import org.meridian.maps.Drawing;

/**
 * The file formats a figure (or any {@link Drawing}) is written to, chosen by the file's
 * extension. Sizes are physical: a drawing is laid out in points (1/72 inch) and
 * <ul>
 *   <li>SVG ({@link SvgExport}) states its width and height in millimetres, its user unit
 *       being the point, text kept as text;</li>
 *   <li>PDF ({@link PdfExport}) has a page of exactly that size, text kept as text in the
 *       embedded (subset) font;</li>
 *   <li>PNG and TIFF ({@link RasterExport}) have width = mm / 25.4 × dpi pixels, and store the
 *       resolution (PNG pHYs chunk, TIFF resolution tags) so that the image opens at its
 *       physical size.</li>
 * </ul>
 * Every file is written through {@code io.AtomicFiles}.
 */
public enum ExportFormat {
    SVG("svg"), PDF("pdf"), PNG("png"), TIFF("tiff");

    /** Points per millimetre. */
    public static final double PT_PER_MM = 72 / 25.4;
    /** The resolutions accepted for raster output. */
    public static final int MIN_DPI = 72;
    public static final int MAX_DPI = 2400;

    private final String extension;

    ExportFormat(String extension) {
        this.extension = extension;
    }

    public String extension() {
        return extension;
    }

    public boolean isRaster() {
        return this == PNG || this == TIFF;
    }

    /** The format of a file name's extension, or a {@link BadInputException} naming the file. */
    public static ExportFormat of(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        for (ExportFormat f : values()) {
            if (name.endsWith("." + f.extension)) {
                return f;
            }
        }
        if (name.endsWith(".tif")) {
            return TIFF;
        }
        throw new BadInputException(file + ": the figure must be a .svg, .pdf, .png or .tiff file");
    }

    /** Checks a raster resolution, naming the option or field it came from. */
    public static int requireDpi(int dpi, String what) {
        if (dpi < MIN_DPI || dpi > MAX_DPI) {
            throw new BadInputException(what + ": resolution must be " + MIN_DPI + " to " + MAX_DPI
                    + " dpi, got " + dpi);
        }
        return dpi;
    }

    /**
     * Writes the drawing at a physical size.
     *
     * @param dpi pixels per inch for PNG and TIFF (ignored by the vector formats)
     */
    public void write(Drawing drawing, Path file, double widthMm, double heightMm, int dpi) {
        if (!(widthMm > 0) || !(heightMm > 0) || !Double.isFinite(widthMm) || !Double.isFinite(heightMm)) {
            throw new BadInputException("a figure's size must be positive, got " + widthMm + " × " + heightMm + " mm");
        }
        switch (this) {
            case SVG -> SvgExport.write(drawing, file, widthMm, heightMm);
            case PDF -> PdfExport.write(drawing, file, widthMm, heightMm);
            case PNG, TIFF -> RasterExport.write(drawing, file, widthMm, heightMm, requireDpi(dpi, "option --dpi"), this);
            default -> throw new AssertionError(this);
        }
    }

    /** Writes the drawing at a width, its height following the drawing's aspect ratio. */
    public void write(Drawing drawing, Path file, double widthMm, int dpi) {
        write(drawing, file, widthMm, widthMm / drawing.aspectRatio(), dpi);
    }
}
