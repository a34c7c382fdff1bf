package org.meridian.montage;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.core.ChannelPlacement;
import org.meridian.core.ChannelPlacement.How;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;

class ChannelPositionsTest {
    @Test
    void labelsMatchStandardAliasOrNothing() {
        ChannelPositions.Resolution r = ChannelPositions.resolve(List.of("cz", "T3", "VEOG", "Pzz"), null);
        assertThat(r.placements()).extracting(ChannelPlacement::how)
                .containsExactly(How.STANDARD, How.ALIAS, How.UNPOSITIONED, How.UNPOSITIONED);
        assertThat(r.placements().get(1).detail()).isEqualTo("T7");
        assertThat(r.placements().get(3).detail()).isEqualTo("Pz");
        assertThat(r.montage().labels()).containsExactly("cz", "T3");
        assertThat(r.montage().source()).isEqualTo("standard 10-5 positions");
    }

    @Test
    void montageFileComesFirst() {
        Montage file = new Montage(List.of(new Electrode("Cz", 0, 0.1, 1)), "montage.tsv");
        ChannelPositions.Resolution r = ChannelPositions.resolve(List.of("Cz", "Pz"), file);
        assertThat(r.placements()).extracting(ChannelPlacement::how)
                .containsExactly(How.MONTAGE_FILE, How.STANDARD);
        assertThat(r.montage().find("Cz").orElseThrow().y()).isGreaterThan(0.05);
        assertThat(r.montage().source()).contains("montage.tsv").contains("standard");
    }

    @Test
    void anOldNameTakesTheMontageFilesMeasuredPositionUnderTheNewName() {
        // ACNS (2006): T3 is T7 and T5 is P7; a measured position (here 5° off the template)
        // outranks the template under either name.
        Electrode measuredT7 = new Electrode("T7", -0.99, 0.087, 0.05);
        Electrode measuredT5 = new Electrode("T5", -0.80, -0.55, 0.1);
        Montage file = new Montage(List.of(measuredT7, measuredT5, new Electrode("Cz", 0, 0, 1)), "montage.tsv");
        ChannelPositions.Resolution r = ChannelPositions.resolve(List.of("T3", "P7", "Cz", "Pz"), file);
        assertThat(r.placements()).extracting(ChannelPlacement::how)
                .containsExactly(How.MONTAGE_FILE, How.MONTAGE_FILE, How.MONTAGE_FILE, How.STANDARD);
        assertThat(r.montage().find("T3").orElseThrow().cosineTo(measuredT7)).isCloseTo(1, within(1e-12));
        assertThat(r.montage().find("P7").orElseThrow().cosineTo(measuredT5)).isCloseTo(1, within(1e-12));
        assertThat(r.montage().find("T3").orElseThrow().cosineTo(Labels.standardPosition("T7").orElseThrow()))
                .isLessThan(0.999);
    }
}
