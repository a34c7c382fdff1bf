package org.meridian.montage;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.core.Electrode;

class LabelsTest {
    @Test
    void homologuesSwapOddAndEvenInTheSameRow() {
        // ACNS (2006): odd numbers on the left, even on the right, z on the midline.
        assertThat(Labels.homologue("F3")).hasValue("F4");
        assertThat(Labels.homologue("PO10")).hasValue("PO9");
        assertThat(Labels.homologue("FC5h")).hasValue("FC6h");
        assertThat(Labels.homologue("fc5h")).hasValue("fc6h");
        assertThat(Labels.homologue("Cz")).isEmpty();
        assertThat(Labels.homologue("VEOG")).isEmpty();
    }

    @Test
    void oldNamesPairWithinTheOldNaming() {
        // Jasper (1958): T3/T4 (mid-temporal) and T5/T6 (posterior temporal) are left/right
        // pairs; ACNS (2006) renamed them T7/T8 and P7/P8, which keep the odd-left rule.
        assertThat(Labels.homologue("T3")).hasValue("T4");
        assertThat(Labels.homologue("T4")).hasValue("T3");
        assertThat(Labels.homologue("T5")).hasValue("T6");
        assertThat(Labels.homologue("t6")).hasValue("t5");
        assertThat(Labels.side("T3")).isEqualTo(-1);
        assertThat(Labels.side("T6")).isEqualTo(1);
    }

    @Test
    void numberedLabelsWithoutAStandardPositionHaveNoSideAndNoHomologue() {
        // ACNS (2006): the odd-left/even-right rule belongs to the 10-20 family's names; a
        // geodesic net's E1…E128 or an amplifier's EXG1 say nothing about the side (common
        // practice).
        for (String label : List.of("E1", "E2", "E17", "E18", "EXG1", "EXG2", "HEOG1", "HEOG2",
                "M1", "M2", "A1", "A2", "Ch12")) {
            assertThat(Labels.side(label)).as(label).isZero();
            assertThat(Labels.homologue(label)).as(label).isEmpty();
        }
    }

    @Test
    void sideFollowsTheNumberAndThePosition() {
        // ACNS (2006): odd numbers on the left, even on the right; in our frame left is -x.
        assertThat(Labels.side("C3")).isEqualTo(-1);
        assertThat(Labels.side("C4")).isEqualTo(1);
        assertThat(Labels.side("Cz")).isZero();
        assertThat(Labels.side("HEOG")).isZero();
        for (String label : StandardSystem.labels10_5()) {
            Electrode e = Labels.standardPosition(label).orElseThrow();
            assertThat(Labels.side(label)).as(label).isEqualTo((int) Math.signum(Math.rint(e.x() * 1e9)));
        }
    }

    @Test
    void spellingsListEveryNameOfAPosition() {
        // ACNS (2006): T3 = T7, T4 = T8, T5 = P7, T6 = P8.
        assertThat(Labels.spellings("T3")).containsExactly("T3", "T7");
        assertThat(Labels.spellings("p8")).containsExactly("p8", "T6");
        assertThat(Labels.spellings("Fz")).containsExactly("Fz");
    }

    @Test
    void likelyIntendedCatchesOneLetterSlips() {
        assertThat(Labels.likelyIntended("Pzz")).hasValue("Pz");
        assertThat(Labels.likelyIntended("CZZ")).hasValue("Cz");
        assertThat(Labels.likelyIntended("Fp3")).hasValue("Fp1");
        assertThat(Labels.likelyIntended("VEOG")).isEmpty();
        assertThat(Labels.likelyIntended("T9x")).hasValue("T9");
    }

    @Test
    void referenceAndNonScalpChannelsGetNoTypoGuess() {
        // common practice: earlobe (A1, A2) and mastoid (M1, M2) references, ocular, cardiac,
        // muscle and external channels are in most ERP recordings; none is a misspelt scalp site.
        for (String label : List.of("A1", "A2", "M1", "M2", "LM", "RM", "HEOG", "VEOG", "HEOGL",
                "VEOGU", "EOG1", "LO1", "IO2", "SO1", "ECG", "EKG", "EMG2", "EXG3", "Status", "GND", "REF")) {
            assertThat(Labels.isNonScalp(label)).as(label).isTrue();
            assertThat(Labels.likelyIntended(label)).as(label).isEmpty();
        }
        for (String label : StandardSystem.labels10_5()) {
            assertThat(Labels.isNonScalp(label)).as(label).isFalse();
        }
        // common practice: geodesic nets number their channels E1 … E256; E3 is no slip for F3
        for (String label : List.of("E1", "E3", "E10", "e7")) {
            assertThat(Labels.likelyIntended(label)).as(label).isEmpty();
        }
    }

    @Test
    void rarelyUsedLowRowsAreNoTypoTargets() {
        // Oostenveld & Praamstra (2001): the N, NFp, OI and I rows lie below the 10 % ring and
        // are on few caps (common practice), so a slip is not taken for one of them.
        for (String label : StandardSystem.labels10_5()) {
            if (label.matches("(N|NFp|OI|I)\\d+h?")) {
                assertThat(Labels.likelyIntended(label + "x")).as(label).isNotEqualTo(
                        java.util.Optional.of(label));
            }
        }
        assertThat(Labels.likelyIntended("Izz")).hasValue("Iz");
    }

    @Test
    void editDistanceCountsEdits() {
        // Levenshtein (1966): insertions, deletions and substitutions each cost one.
        assertThat(Labels.editDistance("kitten", "sitting")).isEqualTo(3);
        assertThat(Labels.editDistance("", "abc")).isEqualTo(3);
        assertThat(Labels.editDistance("fz", "fz")).isZero();
    }
}
