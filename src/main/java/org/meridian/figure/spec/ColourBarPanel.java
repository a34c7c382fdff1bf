package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;

/** The colour bar shared by every map strip of the figure (one scale, one set of limits). */
public record ColourBarPanel(@JsonProperty("width") Double width) implements PanelSpec {
    public static final String TYPE = "colour-bar";
    /** A narrow share by default: beside a strip of maps (share 1) it takes about a tenth. */
    public static final double DEFAULT_WIDTH = 0.12;

    public ColourBarPanel {
        width = width == null ? DEFAULT_WIDTH : PanelSpec.share(width, "width");
    }

    public static ColourBarPanel standard() {
        return new ColourBarPanel(null);
    }

    @Override
    public boolean lettered() {
        return false;
    }
}
