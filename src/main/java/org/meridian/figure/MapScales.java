package org.meridian.figure;

import org.meridian.maps.ColourLimits;
import org.meridian.maps.MapStyle;

/** What all map strips and the colour bar of a figure share: limits, style and unit label. */
public record MapScales(ColourLimits limits, MapStyle style, String unitLabel) {
}
