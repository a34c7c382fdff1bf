package org.meridian.sim;

/**
 * A condition of a scenario: its name, how many trials each participant is presented, and the
 * smallest fraction of them kept after artefact rejection. Each participant keeps
 * presented − U trials, U uniform on 0 … ⌊(1 − minKeptFraction) · presented⌋.
 */
public record ConditionSpec(String name, int trialsPresented, double minKeptFraction) {

    public ConditionSpec {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a condition needs a name");
        }
        if (trialsPresented < 1) {
            throw new IllegalArgumentException("condition " + name
                    + " needs at least one trial, got " + trialsPresented);
        }
        if (!(minKeptFraction > 0 && minKeptFraction <= 1)) {
            throw new IllegalArgumentException("condition " + name
                    + ": kept fraction must lie in (0, 1], got " + minKeptFraction);
        }
    }

    /** The largest number of trials a participant may lose. */
    public int maxRejected() {
        // the small allowance keeps 0.8 × 100 from rounding down to 19.999…
        return Math.min(trialsPresented - 1,
                (int) Math.floor((1 - minKeptFraction) * trialsPresented + 1e-9));
    }
}
