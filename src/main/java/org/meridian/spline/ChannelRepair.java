package org.meridian.spline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.meridian.core.BadInputException;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;

/**
 * Replaces named channels by the spherical-spline interpolation of all other positioned
 * channels (Perrin et al., 1989): a spline is fitted to the positions of the good channels, and
 * each repaired channel becomes the spline's value at its own position, sample by sample, as
 * one matrix product per waveform. Every other channel, unpositioned ones included, is kept as
 * it is. The values are interpolated in their own unit, so CSD data can be repaired too.
 */
public final class ChannelRepair {
    private final List<String> repaired;
    private final SphericalSpline spline;
    private final ChannelTransform transform;

    /**
     * @param montage  the positioned channels of the data
     * @param channels the channels to repair (labels of the montage, ignoring case)
     */
    public ChannelRepair(Montage montage, List<String> channels, SplineParameters parameters) {
        Map<String, Electrode> bad = new LinkedHashMap<>();
        for (String label : channels) {
            Electrode e = montage.find(label).orElseThrow(() -> new BadInputException(
                    "channel " + label + " has no position (" + montage.source()
                            + "), so it cannot be repaired"));
            bad.putIfAbsent(Montage.key(label), e);
        }
        if (bad.isEmpty()) {
            throw new BadInputException("no channels to repair were given");
        }
        List<String> good = new ArrayList<>();
        for (String label : montage.labels()) {
            if (!bad.containsKey(Montage.key(label))) {
                good.add(label);
            }
        }
        if (good.size() < SphericalSpline.MIN_CHANNELS) {
            throw new BadInputException("repairing " + bad.size() + " of " + montage.size()
                    + " positioned channels leaves " + good.size() + " to interpolate from; at least "
                    + SphericalSpline.MIN_CHANNELS + " are needed");
        }
        List<Electrode> targets = new ArrayList<>(bad.values());
        this.repaired = targets.stream().map(Electrode::label).toList();
        this.spline = SphericalSpline.fit(montage.select(good), parameters);
        this.transform = spline.transformAt(Quantity.POTENTIAL, targets);
    }

    /** The repaired channels, with the montage's spelling, without duplicates. */
    public List<String> repairedChannels() {
        return repaired;
    }

    /** The waveforms with the repaired channels replaced; all other rows are copied. */
    public Waveforms of(Waveforms data) {
        int samples = data.sampleCount();
        float[] values = data.copyValues();
        float[] interpolated = transform.apply(data, spline.rowsIn(data));
        for (int k = 0; k < repaired.size(); k++) {
            int row = data.requireIndex(repaired.get(k));
            System.arraycopy(interpolated, k * samples, values, row * samples, samples);
        }
        return Waveforms.wrap(data.labels(), data.axis(), data.unit(), values);
    }

    /** How many positioned channels the repaired ones are interpolated from. */
    public int sourceChannelCount() {
        return spline.channelCount();
    }

    /**
     * The repair of named channels of a study, after checking that each is a channel of the
     * study and has a position.
     */
    public static ChannelRepair forStudy(Study study, List<String> channels, SplineParameters parameters) {
        for (String label : channels) {
            if (study.waveforms(0, 0).indexOf(label) < 0) {
                throw new BadInputException(study.name() + " has no channel " + label + " to repair");
            }
        }
        for (ChannelPlacement p : study.placements()) {
            if (!p.positioned() && channels.stream().anyMatch(p.label()::equalsIgnoreCase)) {
                throw new BadInputException("channel " + p.label()
                        + " has no position, so it cannot be repaired");
            }
        }
        return new ChannelRepair(study.montage(), channels, parameters);
    }

    /** Every cell of the study with the channels repaired. */
    public Study of(Study study) {
        return study.mapWaveforms(study.name() + " (repaired " + String.join(", ", repaired) + ")",
                (p, c) -> of(study.waveforms(p, c)));
    }

    /** Every cell of a study with the named channels repaired. */
    public static Study of(Study study, List<String> channels, SplineParameters parameters) {
        return forStudy(study, channels, parameters).of(study);
    }
}
