package org.meridian.maps;

import java.util.List;
import org.meridian.core.BadInputException;

/**
 * The colour scales offered for maps. There is deliberately no rainbow scale: its uneven
 * lightness draws false edges into smooth fields.
 */
public final class ColourScales {
    /**
     * The default: Moreland's (2009) perceptually uniform diverging scale from blue
     * (sRGB 59, 76, 192) through a light grey (L* = 88) to red (180, 4, 38), built in Msh space.
     * Zero is the light midpoint; equal distances from zero look equally strong.
     */
    public static final ColourScale DIVERGING =
            new MshDivergingScale("diverging", 0x3b4cc0, 0xb40426, Double.NaN);

    /**
     * Our colour-blind-safe alternative: dark blue (CIELAB 22, 40 at hue −70°; sRGB 24, 49, 109)
     * through a neutral grey (L* = 57.5) to pale yellow (CIELAB 93, 50 at hue 102°; sRGB 247, 238,
     * 139), built the same way in Msh space. Lightness rises steadily from the most negative to
     * the most positive value, so the order of values survives every kind of colour blindness
     * (and a grey-scale print); the sign is carried both by lightness and by the blue–yellow
     * contrast, which protanopes and deuteranopes keep. The two arms have equal perceptual length.
     */
    public static final ColourScale BLUE_YELLOW =
            new MshDivergingScale("blue-yellow", 0x18316d, 0xf7ee8b, 57.5);

    private ColourScales() {
    }

    public static List<ColourScale> all() {
        return List.of(DIVERGING, BLUE_YELLOW);
    }

    /** The scale of that name (ignoring case), or a {@link BadInputException} listing the names. */
    public static ColourScale byName(String name) {
        for (ColourScale s : all()) {
            if (s.name().equalsIgnoreCase(name.trim())) {
                return s;
            }
        }
        throw new BadInputException("no colour scale \"" + name + "\" (there are "
                + String.join(", ", all().stream().map(ColourScale::name).toList()) + ")");
    }
}
