package org.meridian.maps;

import java.util.Collection;
import java.util.Set;
import java.util.TreeSet;

/**
 * How a map is drawn (not what it shows): the colour scale, whether contour lines, electrode
 * markers and labels appear, which electrodes are highlighted, and a factor on every line width
 * and font size. Immutable; change one setting with the {@code with…} methods.
 *
 * @param highlighted labels of highlighted electrodes, compared ignoring case
 * @param sizeFactor  multiplies line widths, marker sizes and fonts (1 = the default look)
 */
public record MapStyle(ColourScale scale, boolean contours, boolean markers, boolean labels,
        Set<String> highlighted, double sizeFactor) {

    public MapStyle {
        if (scale == null) {
            throw new IllegalArgumentException("a map style needs a colour scale");
        }
        if (!(sizeFactor > 0) || !Double.isFinite(sizeFactor)) {
            throw new IllegalArgumentException("size factor must be positive, got " + sizeFactor);
        }
        TreeSet<String> keys = new TreeSet<>(String.CASE_INSENSITIVE_ORDER);
        keys.addAll(highlighted == null ? Set.of() : highlighted);
        highlighted = java.util.Collections.unmodifiableSet(keys);
    }

    /** The diverging scale, contours and markers on, no labels, nothing highlighted. */
    public static MapStyle defaults() {
        return new MapStyle(ColourScales.DIVERGING, true, true, false, Set.of(), 1);
    }

    public MapStyle withScale(ColourScale s) {
        return new MapStyle(s, contours, markers, labels, highlighted, sizeFactor);
    }

    public MapStyle withContours(boolean on) {
        return new MapStyle(scale, on, markers, labels, highlighted, sizeFactor);
    }

    public MapStyle withMarkers(boolean on) {
        return new MapStyle(scale, contours, on, labels, highlighted, sizeFactor);
    }

    public MapStyle withLabels(boolean on) {
        return new MapStyle(scale, contours, markers, on, highlighted, sizeFactor);
    }

    public MapStyle withHighlighted(Collection<String> labelsToHighlight) {
        return new MapStyle(scale, contours, markers, labels, Set.copyOf(labelsToHighlight), sizeFactor);
    }

    public MapStyle withSizeFactor(double factor) {
        return new MapStyle(scale, contours, markers, labels, highlighted, factor);
    }

    public boolean isHighlighted(String label) {
        return highlighted.contains(label);
    }
}
