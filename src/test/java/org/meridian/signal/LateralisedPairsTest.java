package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Which channels a lateralised wave pairs, for labels outside the 10-5 names and old names. */
class LateralisedPairsTest {
    @Test
    void numberedChannelsWithoutAStandardPositionAreNotPaired() {
        // ACNS (2006): odd-left/even-right is a rule of the 10-20 family's names only; a
        // geodesic net's E17/E18 or an amplifier's EXG1/EXG2 are no left/right pair.
        assertThat(LateralisedWave.pairs(List.of("E1", "E2", "E17", "E18", "EXG1", "EXG2", "HEOG1",
                "HEOG2", "M1", "M2"))).isEmpty();
    }

    @Test
    void oldNamesKeepTheirPairs() {
        // Jasper (1958): T3/T4 and T5/T6 are homologous temporal sites (ACNS 2006: T7/T8, P7/P8).
        assertThat(LateralisedWave.pairs(List.of("T3", "T4", "T5", "T6", "C3", "C4")))
                .extracting(p -> p[0] + "/" + p[1]).containsExactly("T3/T4", "T5/T6", "C3/C4");
    }
}
