package org.meridian.sim;

import org.meridian.core.Study;

/** A simulated study (averaged waveforms in µV, average reference) and its ground truth. */
public record Simulation(Study study, GroundTruth truth) {
}
