package org.meridian.figure;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;
import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.TimeZone;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.meridian.io.AtomicFiles;
import org.meridian.maps.Drawing;

/**
 * PDF through PDFBox, with a {@code Graphics2D} that writes PDF drawing operators. The page is
 * exactly the figure's size. Text in the bundled face ({@link FigureFonts}) is written as text
 * in that font, embedded as a subset, so the file passes a publisher's "all fonts embedded"
 * check and its words can still be searched and selected; text in any other font (and the
 * synthetic bold of panel letters) is drawn as outlines, so no font is ever referenced without
 * being embedded.
 */
final class PdfExport {
    private PdfExport() {
    }

    static void write(Drawing drawing, Path file, double widthMm, double heightMm) {
        byte[] bytes = bytes(drawing, widthMm, heightMm, file.getFileName().toString());
        AtomicFiles.write(file, out -> out.write(bytes));
    }

    static byte[] bytes(Drawing drawing, double widthMm, double heightMm, String title) {
        float w = (float) (widthMm * ExportFormat.PT_PER_MM);
        float h = (float) (heightMm * ExportFormat.PT_PER_MM);
        try (PDDocument doc = new PDDocument();
                PdfBoxGraphics2DFontTextDrawer text = new PdfBoxGraphics2DFontTextDrawer();
                InputStream font = FigureFonts.bundledFontFile()) {
            PDPage page = new PDPage(new PDRectangle(w, h));
            doc.addPage(page);
            text.registerFont(FigureFonts.BUNDLED_FAMILY, font);
            PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, w, h);
            g.setFontTextDrawer(text);
            try {
                g.setColor(Color.WHITE);
                g.fill(new Rectangle2D.Double(0, 0, w, h));
                drawing.draw(g, new Rectangle2D.Double(0, 0, w, h));
            } finally {
                g.dispose();
            }
            PDFormXObject form = g.getXFormObject();
            try (PDPageContentStream content = new PDPageContentStream(doc, page)) {
                content.drawForm(form);
            }
            PDDocumentInformation info = doc.getDocumentInformation();
            info.setTitle(title);
            info.setCreator("Meridian");
            // a fixed date keeps the file the same for the same figure
            Calendar epoch = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
            epoch.setTimeInMillis(0);
            info.setCreationDate(epoch);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
