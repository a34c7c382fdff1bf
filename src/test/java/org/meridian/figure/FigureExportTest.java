package org.meridian.figure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Locale;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.plugins.tiff.BaselineTIFFTagSet;
import javax.imageio.plugins.tiff.TIFFDirectory;
import javax.imageio.plugins.tiff.TIFFField;
import javax.imageio.stream.ImageInputStream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.PDFTextStripperByArea;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meridian.figure.spec.SpecFiles;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class FigureExportTest {
    private static FigureDrawing figure;

    @BeforeAll
    static void draw() {
        figure = DemoFigures.drawing();
    }

    private static int countClass(Document doc, String cssClass) {
        NodeList groups = doc.getElementsByTagName("g");
        int n = 0;
        for (int i = 0; i < groups.getLength(); i++) {
            if (cssClass.equals(((Element) groups.item(i)).getAttribute("class"))) {
                n++;
            }
        }
        return n;
    }

    @Test
    void svgIsWellFormedAtTheSpecsSizeWithAGroupPerPanelAndMap() throws Exception {
        String svg = Figures.svg(figure);
        Document doc = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        Element root = doc.getDocumentElement();
        assertThat(root.getTagName()).isEqualTo("svg");
        // the two-column preset is 175 mm wide
        assertThat(root.getAttribute("width")).isEqualTo("175mm");
        assertThat(root.getAttribute("height")).endsWith("mm");
        assertThat(Double.parseDouble(root.getAttribute("height").replace("mm", ""))).isCloseTo(figure.heightMm(),
                within(1e-3));
        String[] viewBox = root.getAttribute("viewBox").split(" ");
        // one user unit is one point: 175 mm = 175 / 25.4 × 72 pt (the definition of the point)
        assertThat(Double.parseDouble(viewBox[2])).isCloseTo(175 / 25.4 * 72, within(1e-3));
        assertThat(countClass(doc, "waveform-panel")).isEqualTo(3);
        assertThat(countClass(doc, "map-strip")).isEqualTo(1);
        assertThat(countClass(doc, "scalp-map")).isEqualTo(5);
        assertThat(countClass(doc, "colour-bar")).isEqualTo(1);
        assertThat(svg).contains(">280 ms<").contains(">P3+Pz+P4<").contains(">Time (ms)<")
                .contains("Liberation Sans");
    }

    @Test
    void theSameSpecGivesTheSameSvgBytes() {
        String first = Figures.svg(figure);
        String second = Figures.svg(DemoFigures.drawing());
        assertThat(second).isEqualTo(first);
    }

    @Test
    void pdfPageIsTheSpecsSizeWithItsTextAndEmbeddedFonts(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("figure.pdf");
        Figures.export(figure, pdf, 300);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(1);
            PDPage page = doc.getPage(0);
            // 1 pt = 25.4 / 72 mm (the PostScript point, which PDF uses)
            assertThat(page.getMediaBox().getWidth() * 25.4 / 72).isCloseTo(175, within(0.1));
            assertThat(page.getMediaBox().getHeight() * 25.4 / 72).isCloseTo(figure.heightMm(), within(0.1));
            String text = new PDFTextStripper().getText(doc);
            assertThat(text).contains("Time (ms)").contains("280 ms").contains("FCz")
                    .contains("rare - frequent").contains("(positive up)");
            // the amplitude label runs upwards: the stripper gives it a letter group a line
            assertThat(text.replaceAll("\\s", "")).contains("Amplitude(µV)");
            // the map times sit under the maps: below the top of the map row
            PDFTextStripperByArea area = new PDFTextStripperByArea();
            float h = page.getMediaBox().getHeight();
            float w = page.getMediaBox().getWidth();
            float strip = (float) figure.layout().placed().get(3).boundsPt().getY();
            area.addRegion("lower", new java.awt.geom.Rectangle2D.Float(0, strip, w, h - strip));
            area.addRegion("upper", new java.awt.geom.Rectangle2D.Float(0, 0, w, strip));
            area.extractRegions(page);
            assertThat(area.getTextForRegion("lower")).contains("340 ms").contains("µV");
            assertThat(area.getTextForRegion("upper")).contains("Time (ms)").doesNotContain("340 ms");
            int fonts = 0;
            for (var form : page.getResources().getXObjectNames()) {
                PDResources resources = ((PDFormXObject) page.getResources().getXObject(form)).getResources();
                for (var name : resources.getFontNames()) {
                    PDFont font = resources.getFont(name);
                    assertThat(font.isEmbedded()).as("font %s embedded", font.getName()).isTrue();
                    fonts++;
                }
            }
            assertThat(fonts).isPositive();
        }
    }

    @Test
    void pngHasThePixelsAndPhysicalSizeOfItsDpi(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("figure.png");
        Figures.export(figure, png, 300);
        BufferedImage image = ImageIO.read(png.toFile());
        // pixels = mm / 25.4 × dpi (25.4 mm to the inch)
        assertThat(image.getWidth()).isEqualTo((int) Math.round(175 / 25.4 * 300));
        assertThat(image.getHeight()).isEqualTo((int) Math.round(figure.heightMm() / 25.4 * 300));
        IIOMetadata meta = metadata(png, "png");
        org.w3c.dom.Node phys = ((org.w3c.dom.Element) meta.getAsTree("javax_imageio_png_1.0"))
                .getElementsByTagName("pHYs").item(0);
        assertThat(phys).isNotNull();
        // PNG specification 11.3.5.3: pixels per metre, unit 1 = metre; 300 dpi = 300 / 0.0254 m
        assertThat(phys.getAttributes().getNamedItem("unitSpecifier").getNodeValue()).isEqualTo("meter");
        assertThat(Long.parseLong(phys.getAttributes().getNamedItem("pixelsPerUnitXAxis").getNodeValue()))
                .isEqualTo(Math.round(300 / 0.0254));
    }

    @Test
    void tiffHasThePixelsAndResolutionTagsOfItsDpi(@TempDir Path dir) throws Exception {
        FigureDrawing narrow = Figures.draw(SpecFiles.parse(DemoFigures.specJson(DemoFigures.STUDY.toString())
                .replace("two-column", "one-column"), "narrow.json"), DemoFigures.study());
        assertThat(narrow.widthMm()).isEqualTo(85);
        Path tiff = dir.resolve("figure.tiff");
        Figures.export(narrow, tiff, 600);
        BufferedImage image = ImageIO.read(tiff.toFile());
        assertThat(image.getWidth()).isEqualTo((int) Math.round(narrow.widthMm() / 25.4 * 600));
        assertThat(image.getHeight()).isEqualTo((int) Math.round(narrow.heightMm() / 25.4 * 600));
        TIFFDirectory tags = TIFFDirectory.createFromMetadata(metadata(tiff, "tiff"));
        TIFFField x = tags.getTIFFField(BaselineTIFFTagSet.TAG_X_RESOLUTION);
        TIFFField unit = tags.getTIFFField(BaselineTIFFTagSet.TAG_RESOLUTION_UNIT);
        // TIFF 6.0 section 8: XResolution is a rational, ResolutionUnit 2 = inch
        assertThat(x.getAsRational(0)).containsExactly(600, 1);
        assertThat(tags.getTIFFField(BaselineTIFFTagSet.TAG_Y_RESOLUTION).getAsRational(0)).containsExactly(600, 1);
        assertThat(unit.getAsInt(0)).isEqualTo(BaselineTIFFTagSet.RESOLUTION_UNIT_INCH);
        try (var files = Files.list(dir)) {
            // written through AtomicFiles: nothing else left in the folder
            assertThat(files.map(p -> p.getFileName().toString())).containsExactly("figure.tiff");
        }
    }

    private static IIOMetadata metadata(Path file, String format) throws Exception {
        Iterator<ImageReader> readers = ImageIO.getImageReadersByFormatName(format.toLowerCase(Locale.ROOT));
        ImageReader reader = readers.next();
        try (ImageInputStream in = ImageIO.createImageInputStream(file.toFile())) {
            reader.setInput(in);
            return reader.getImageMetadata(0);
        } finally {
            reader.dispose();
        }
    }
}
