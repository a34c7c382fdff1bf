package org.meridian.figure;

import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Arrays;
import java.util.Locale;
import org.meridian.core.BadInputException;

/**
 * The fonts a figure is set in. The default family, {@value #DEFAULT_FAMILY}, is the Liberation
 * Sans regular face that ships inside the PDFBox library (SIL Open Font License): it is loaded from
 * the class path, never from the machine's fonts, so text widths, and therefore every position in a
 * figure, are the same on every computer, in the window and on the command line. Liberation Sans
 * has the metrics of Arial and Helvetica, so an SVG viewer that substitutes either still fits every
 * label. Any other family name must be installed on the machine (then the layout follows that
 * machine's copy of the font).
 */
public final class FigureFonts {
    /** The spec's name for the bundled face. */
    public static final String DEFAULT_FAMILY = "sans-serif";
    /** The face's own family name, as Java reports it. */
    static final String BUNDLED_FAMILY = "Liberation Sans";
    private static final String RESOURCE = "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf";
    private static final Font BUNDLED = load();

    private FigureFonts() {
    }

    /** The font of a family at a size in points (bold for panel letters). */
    public static Font font(String family, double sizePt, boolean bold) {
        Font base = isBundled(family) ? BUNDLED : installed(family);
        return base.deriveFont(bold ? Font.BOLD : Font.PLAIN, (float) sizePt);
    }

    /** Whether the family is the bundled face (the default). */
    public static boolean isBundled(String family) {
        return family.equalsIgnoreCase(DEFAULT_FAMILY) || family.equalsIgnoreCase(BUNDLED_FAMILY);
    }

    /** Checks that the family can be used, naming it when it cannot. */
    public static void requireAvailable(String family) {
        if (!isBundled(family)) {
            installed(family);
        }
    }

    /** The bundled TrueType file, for embedding in PDF. */
    static InputStream bundledFontFile() {
        InputStream in = FigureFonts.class.getResourceAsStream(RESOURCE);
        if (in == null) {
            throw new IllegalStateException("the bundled font " + RESOURCE + " is missing from the class path");
        }
        return in;
    }

    /** The family name written into SVG text: the face, then metric-compatible stand-ins. */
    static String svgFamily(String javaFamily) {
        if (javaFamily.equalsIgnoreCase(BUNDLED_FAMILY)) {
            return "Liberation Sans, Arial, Helvetica, sans-serif";
        }
        return javaFamily;
    }

    private static Font installed(String family) {
        String[] names = GraphicsEnvironment.getLocalGraphicsEnvironment().getAvailableFontFamilyNames(Locale.ROOT);
        boolean found = Arrays.stream(names).anyMatch(n -> n.equalsIgnoreCase(family));
        if (!found) {
            throw new BadInputException("font family \"" + family + "\" is not installed on this machine (use \""
                    + DEFAULT_FAMILY + "\", the bundled face that every machine has)");
        }
        return new Font(family, Font.PLAIN, 1);
    }

    private static Font load() {
        try (InputStream in = bundledFontFile()) {
            return Font.createFont(Font.TRUETYPE_FONT, in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("the bundled font cannot be read", e);
        }
    }
}
