package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;

/** The colour bar shared by every map strip of the figure (one scale, one set of limits). */
public record ColourBarPanel(@JsonProperty("width") Double width) implements PanelSpec {
    public static final String TYPE = "colour-bar";

    public ColourBarPanel {
        width = PanelSpec.share(width, "width");
    }

    public static ColourBarPanel standard() {
        return new ColourBarPanel(null);
    }

    @Override
    public boolean lettered() {
        return false;
    }
}
