package org.meridian.figure;

import java.util.List;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;
import org.meridian.measure.Region;
import org.meridian.signal.ConditionWave;

/**
 * A wave at a region: for each participant, the mean of the region's channels of that
 * participant's wave, as one channel named like the region ({@code P3+Pz+P4}). Averaging the
 * channels before the participants makes the interval band the region's own (the spread of the
 * participants' region means), not a mix of the channels' bands.
 */
final class RegionWave implements ConditionWave {
    private final ConditionWave wave;
    private final Region region;

    RegionWave(ConditionWave wave, Region region) {
        this.wave = wave;
        this.region = region;
    }

    @Override
    public String name() {
        return wave.name();
    }

    @Override
    public Waveforms forParticipant(Study study, int participant) {
        Waveforms all = wave.forParticipant(study, participant);
        double[] mean = new double[all.sampleCount()];
        Region.meanInto(all, region.indices(all), 0, mean);
        float[] values = new float[mean.length];
        for (int s = 0; s < mean.length; s++) {
            values[s] = (float) mean[s];
        }
        return Waveforms.wrap(List.of(region.label()), all.axis(), all.unit(), values);
    }

    @Override
    public double trialWeight(Study study, int participant) {
        return wave.trialWeight(study, participant);
    }
}
