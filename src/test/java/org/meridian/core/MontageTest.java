package org.meridian.core;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;

class MontageTest {
    @Test
    void coincidentElectrodesAreRefusedNamingBoth() {
        // 1e-4 rad apart: well inside the 1e-3 rad tolerance (common practice: distinct electrodes are cm apart)
        Electrode a = new Electrode("Fz", 0, 1, 1);
        Electrode b = new Electrode("FCz", 0, 1, 1 + 2e-4);
        assertThatThrownBy(() -> new Montage(List.of(a, new Electrode("Cz", 0, 0, 1), b), "cap.tsv"))
                .isInstanceOfSatisfying(SamePositionException.class, e -> {
                    assertThat(e.first()).isEqualTo("Fz");
                    assertThat(e.second()).isEqualTo("FCz");
                    assertThat(e.source()).isEqualTo("cap.tsv");
                })
                .hasMessage("cap.tsv: electrodes Fz and FCz are at the same position");
    }

    @Test
    void aMontageWithoutASourceHasMessagesWithoutAStrayColon() {
        Electrode a = new Electrode("Fz", 0, 1, 1);
        assertThatThrownBy(() -> new Montage(List.of(a, a.withLabel("fz")), ""))
                .hasMessage("electrode fz is listed twice");
        assertThatThrownBy(() -> new Montage(List.of(a, a.withLabel("Fpz")), null))
                .hasMessage("electrodes Fz and Fpz are at the same position");
    }
}
