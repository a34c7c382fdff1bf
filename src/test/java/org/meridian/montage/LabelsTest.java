package org.meridian.montage;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class LabelsTest {
    @Test
    void homologuesSwapOddAndEvenInTheSameRow() {
        // ACNS (2006): odd numbers on the left, even on the right, z on the midline.
        assertThat(Labels.homologue("F3")).hasValue("F4");
        assertThat(Labels.homologue("PO10")).hasValue("PO9");
        assertThat(Labels.homologue("FC5h")).hasValue("FC6h");
        assertThat(Labels.homologue("T3")).hasValue("T8");
        assertThat(Labels.homologue("Cz")).isEmpty();
        assertThat(Labels.homologue("VEOG")).isEmpty();
    }

    @Test
    void sideFollowsTheNumber() {
        assertThat(Labels.side("C3")).isEqualTo(-1);
        assertThat(Labels.side("C4")).isEqualTo(1);
        assertThat(Labels.side("Cz")).isZero();
        assertThat(Labels.side("HEOG")).isZero();
    }

    @Test
    void likelyIntendedCatchesOneLetterSlips() {
        assertThat(Labels.likelyIntended("Pzz")).hasValue("Pz");
        assertThat(Labels.likelyIntended("VEOG")).isEmpty();
        assertThat(Labels.likelyIntended("T9x")).isPresent();
    }

    @Test
    void editDistanceCountsEdits() {
        // Levenshtein (1966): insertions, deletions and substitutions each cost one.
        assertThat(Labels.editDistance("kitten", "sitting")).isEqualTo(3);
        assertThat(Labels.editDistance("", "abc")).isEqualTo(3);
        assertThat(Labels.editDistance("fz", "fz")).isZero();
    }
}
