package org.meridian.sim;

import java.util.List;

/**
 * What a simulated study really contains: the scenario and seed it came from, and for each
 * participant the trial counts kept and the actual position, orientation, amplitude factor and
 * latency shift of every source. Immutable.
 */
public record GroundTruth(Scenario scenario, long seed, List<ParticipantTruth> participants) {

    public GroundTruth {
        participants = List.copyOf(participants);
    }

    /**
     * One participant.
     *
     * @param trials  trials kept per condition, in the scenario's condition order
     * @param sources one draw per source, in the scenario's source order
     */
    public record ParticipantTruth(String name, List<Integer> trials, List<SourceDraw> sources) {
        public ParticipantTruth {
            trials = List.copyOf(trials);
            sources = List.copyOf(sources);
        }
    }

    /**
     * A source as one participant has it: the moment at time t in condition c is
     * gain(c) · amplitudeFactor · Σ components(t − latencyShiftMs) along {@code orientation}.
     */
    public record SourceDraw(String source, Vector3 positionM, Vector3 orientation,
            double amplitudeFactor, double latencyShiftMs) {
    }
}
