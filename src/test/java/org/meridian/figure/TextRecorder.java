package org.meridian.figure;

import java.awt.Color;
import java.awt.Composite;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.GraphicsConfiguration;
import java.awt.Image;
import java.awt.Paint;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.font.FontRenderContext;
import java.awt.font.GlyphVector;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.awt.image.BufferedImageOp;
import java.awt.image.ImageObserver;
import java.awt.image.RenderedImage;
import java.awt.image.renderable.RenderableImage;
import java.text.AttributedCharacterIterator;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A {@code Graphics2D} that draws into an image as usual and also records, for every piece of
 * text drawn (by it or by any graphics made from it with {@code create()}), the text and the box
 * its ink covers on the page: for layout tests that look for text that collides or leaves the page.
 */
final class TextRecorder extends Graphics2D {
    /** One piece of text and its ink's bounding box in page units. */
    record Text(String text, Rectangle2D box) {
    }

    private final Graphics2D target;
    private final List<Text> texts;

    private TextRecorder(Graphics2D target, List<Text> texts) {
        this.target = target;
        this.texts = texts;
    }

    /** A recorder over an image of a page of the given size in points, at one pixel per point. */
    static TextRecorder page(double widthPt, double heightPt) {
        BufferedImage image = new BufferedImage((int) Math.ceil(widthPt), (int) Math.ceil(heightPt),
                BufferedImage.TYPE_INT_ARGB);
        return new TextRecorder(image.createGraphics(), new ArrayList<>());
    }

    List<Text> texts() {
        return texts;
    }

    private void record(String s, Rectangle2D local) {
        if (s.isBlank()) {
            return;
        }
        texts.add(new Text(s, target.getTransform().createTransformedShape(local).getBounds2D()));
    }

    private void recordString(String s, double x, double y) {
        GlyphVector gv = getFont().createGlyphVector(getFontRenderContext(), s);
        Rectangle2D ink = gv.getVisualBounds();
        record(s, new Rectangle2D.Double(ink.getX() + x, ink.getY() + y, ink.getWidth(), ink.getHeight()));
    }

    @Override
    public void drawString(String s, int x, int y) {
        recordString(s, x, y);
        target.drawString(s, x, y);
    }

    @Override
    public void drawString(String s, float x, float y) {
        recordString(s, x, y);
        target.drawString(s, x, y);
    }

    @Override
    public void drawString(AttributedCharacterIterator it, int x, int y) {
        drawString(it, (float) x, (float) y);
    }

    @Override
    public void drawString(AttributedCharacterIterator it, float x, float y) {
        StringBuilder s = new StringBuilder();
        for (char c = it.first(); c != AttributedCharacterIterator.DONE; c = it.next()) {
            s.append(c);
        }
        it.first();
        Rectangle2D b = new TextLayout(it, getFontRenderContext()).getBounds();
        record(s.toString(), new Rectangle2D.Double(b.getX() + x, b.getY() + y, b.getWidth(), b.getHeight()));
        it.first();
        target.drawString(it, x, y);
    }

    @Override
    public void drawGlyphVector(GlyphVector g, float x, float y) {
        Rectangle2D b = g.getVisualBounds();
        record("glyphs", new Rectangle2D.Double(b.getX() + x, b.getY() + y, b.getWidth(), b.getHeight()));
        target.drawGlyphVector(g, x, y);
    }

    @Override
    public Graphics create() {
        return new TextRecorder((Graphics2D) target.create(), texts);
    }

    // everything else is the image's own graphics

    @Override public void draw(Shape s) { target.draw(s); }
    @Override public boolean drawImage(Image img, AffineTransform xform, ImageObserver obs) { return target.drawImage(img, xform, obs); }
    @Override public void drawImage(BufferedImage img, BufferedImageOp op, int x, int y) { target.drawImage(img, op, x, y); }
    @Override public void drawRenderedImage(RenderedImage img, AffineTransform xform) { target.drawRenderedImage(img, xform); }
    @Override public void drawRenderableImage(RenderableImage img, AffineTransform xform) { target.drawRenderableImage(img, xform); }
    @Override public void fill(Shape s) { target.fill(s); }
    @Override public boolean hit(Rectangle rect, Shape s, boolean onStroke) { return target.hit(rect, s, onStroke); }
    @Override public GraphicsConfiguration getDeviceConfiguration() { return target.getDeviceConfiguration(); }
    @Override public void setComposite(Composite comp) { target.setComposite(comp); }
    @Override public void setPaint(Paint paint) { target.setPaint(paint); }
    @Override public void setStroke(Stroke s) { target.setStroke(s); }
    @Override public void setRenderingHint(RenderingHints.Key k, Object v) { target.setRenderingHint(k, v); }
    @Override public Object getRenderingHint(RenderingHints.Key k) { return target.getRenderingHint(k); }
    @Override public void setRenderingHints(Map<?, ?> hints) { target.setRenderingHints(hints); }
    @Override public void addRenderingHints(Map<?, ?> hints) { target.addRenderingHints(hints); }
    @Override public RenderingHints getRenderingHints() { return target.getRenderingHints(); }
    @Override public void translate(int x, int y) { target.translate(x, y); }
    @Override public void translate(double tx, double ty) { target.translate(tx, ty); }
    @Override public void rotate(double theta) { target.rotate(theta); }
    @Override public void rotate(double theta, double x, double y) { target.rotate(theta, x, y); }
    @Override public void scale(double sx, double sy) { target.scale(sx, sy); }
    @Override public void shear(double shx, double shy) { target.shear(shx, shy); }
    @Override public void transform(AffineTransform tx) { target.transform(tx); }
    @Override public void setTransform(AffineTransform tx) { target.setTransform(tx); }
    @Override public AffineTransform getTransform() { return target.getTransform(); }
    @Override public Paint getPaint() { return target.getPaint(); }
    @Override public Composite getComposite() { return target.getComposite(); }
    @Override public void setBackground(Color color) { target.setBackground(color); }
    @Override public Color getBackground() { return target.getBackground(); }
    @Override public Stroke getStroke() { return target.getStroke(); }
    @Override public void clip(Shape s) { target.clip(s); }
    @Override public FontRenderContext getFontRenderContext() { return target.getFontRenderContext(); }
    @Override public Color getColor() { return target.getColor(); }
    @Override public void setColor(Color c) { target.setColor(c); }
    @Override public void setPaintMode() { target.setPaintMode(); }
    @Override public void setXORMode(Color c) { target.setXORMode(c); }
    @Override public Font getFont() { return target.getFont(); }
    @Override public void setFont(Font font) { target.setFont(font); }
    @Override public FontMetrics getFontMetrics(Font f) { return target.getFontMetrics(f); }
    @Override public Rectangle getClipBounds() { return target.getClipBounds(); }
    @Override public void clipRect(int x, int y, int w, int h) { target.clipRect(x, y, w, h); }
    @Override public void setClip(int x, int y, int w, int h) { target.setClip(x, y, w, h); }
    @Override public Shape getClip() { return target.getClip(); }
    @Override public void setClip(Shape clip) { target.setClip(clip); }
    @Override public void copyArea(int x, int y, int w, int h, int dx, int dy) { target.copyArea(x, y, w, h, dx, dy); }
    @Override public void drawLine(int x1, int y1, int x2, int y2) { target.drawLine(x1, y1, x2, y2); }
    @Override public void fillRect(int x, int y, int w, int h) { target.fillRect(x, y, w, h); }
    @Override public void clearRect(int x, int y, int w, int h) { target.clearRect(x, y, w, h); }
    @Override public void drawRoundRect(int x, int y, int w, int h, int aw, int ah) { target.drawRoundRect(x, y, w, h, aw, ah); }
    @Override public void fillRoundRect(int x, int y, int w, int h, int aw, int ah) { target.fillRoundRect(x, y, w, h, aw, ah); }
    @Override public void drawOval(int x, int y, int w, int h) { target.drawOval(x, y, w, h); }
    @Override public void fillOval(int x, int y, int w, int h) { target.fillOval(x, y, w, h); }
    @Override public void drawArc(int x, int y, int w, int h, int a, int b) { target.drawArc(x, y, w, h, a, b); }
    @Override public void fillArc(int x, int y, int w, int h, int a, int b) { target.fillArc(x, y, w, h, a, b); }
    @Override public void drawPolyline(int[] xs, int[] ys, int n) { target.drawPolyline(xs, ys, n); }
    @Override public void drawPolygon(int[] xs, int[] ys, int n) { target.drawPolygon(xs, ys, n); }
    @Override public void fillPolygon(int[] xs, int[] ys, int n) { target.fillPolygon(xs, ys, n); }
    @Override public boolean drawImage(Image img, int x, int y, ImageObserver o) { return target.drawImage(img, x, y, o); }
    @Override public boolean drawImage(Image img, int x, int y, int w, int h, ImageObserver o) { return target.drawImage(img, x, y, w, h, o); }
    @Override public boolean drawImage(Image img, int x, int y, Color bg, ImageObserver o) { return target.drawImage(img, x, y, bg, o); }
    @Override public boolean drawImage(Image img, int x, int y, int w, int h, Color bg, ImageObserver o) { return target.drawImage(img, x, y, w, h, bg, o); }
    @Override public boolean drawImage(Image img, int dx1, int dy1, int dx2, int dy2, int sx1, int sy1, int sx2, int sy2, ImageObserver o) {
        return target.drawImage(img, dx1, dy1, dx2, dy2, sx1, sy1, sx2, sy2, o);
    }
    @Override public boolean drawImage(Image img, int dx1, int dy1, int dx2, int dy2, int sx1, int sy1, int sx2, int sy2, Color bg,
            ImageObserver o) {
        return target.drawImage(img, dx1, dy1, dx2, dy2, sx1, sy1, sx2, sy2, bg, o);
    }
    @Override public void dispose() { target.dispose(); }
}
