package org.meridian.montage;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.meridian.core.Electrode;
import org.meridian.core.Montage;
import org.meridian.io.MontageWriter;

class StandardSystemTest {
    private static final Montage TEN_FIVE = StandardSystem.TEN_FIVE.montage();

    private static Electrode at(String label) {
        return TEN_FIVE.find(label).orElseThrow(() -> new AssertionError("no " + label));
    }

    private static double angleDeg(String a, String b) {
        return Math.toDegrees(Math.acos(at(a).cosineTo(at(b))));
    }

    @Test
    void czIsTheVertex() {
        // Jasper (1958): Cz lies at the vertex, halfway along both the nasion–inion and the
        // preauricular arcs; in our frame that is +z.
        assertThat(at("Cz").z()).isCloseTo(1.0, within(1e-12));
    }

    @Test
    void tenPercentRingIsTheEquatorWithFpzT7OzT8NinetyDegreesApart() {
        // Jasper (1958): Fpz, T7 (T3), Oz and T8 (T4) lie on the 10 % ring around the head.
        for (String l : List.of("Fpz", "T7", "Oz", "T8")) {
            assertThat(at(l).z()).as(l).isCloseTo(0.0, within(1e-12));
        }
        assertThat(angleDeg("Fpz", "T7")).isCloseTo(90, within(1e-9));
        assertThat(angleDeg("T7", "Oz")).isCloseTo(90, within(1e-9));
        assertThat(angleDeg("Oz", "T8")).isCloseTo(90, within(1e-9));
        assertThat(angleDeg("T8", "Fpz")).isCloseTo(90, within(1e-9));
        assertThat(at("T7").x()).isCloseTo(-1, within(1e-12));
        assertThat(at("Fpz").y()).isCloseTo(1, within(1e-12));
    }

    @ParameterizedTest
    @ValueSource(strings = {"Fz", "Pz", "C3", "C4"})
    void twentyPercentPositionsLieFortyFiveDegreesFromCz(String label) {
        // Jasper (1958): Fz, Pz, C3, C4 are one 20 % step (of the 180° arc) from Cz = 36°
        // of arc along the nasion–inion or preauricular line on the real head; with the 10 %
        // ring as the equator the step is 45° (DESIGN §3 convention).
        assertThat(angleDeg("Cz", label)).isCloseTo(45, within(1e-9));
    }

    @Test
    void midlineAndCoronalStepsAreEqual() {
        // Jasper (1958), extended to 10-10 by ACNS (2006): equal steps along the midline and
        // the coronal line; 22.5° per 10-10 step in our convention.
        List<String> midline = List.of("Nz", "Fpz", "AFz", "Fz", "FCz", "Cz", "CPz", "Pz",
                "POz", "Oz", "Iz");
        for (int i = 1; i < midline.size(); i++) {
            assertThat(angleDeg(midline.get(i - 1), midline.get(i)))
                    .as(midline.get(i - 1) + "–" + midline.get(i)).isCloseTo(22.5, within(1e-9));
        }
        List<String> coronal = List.of("T9", "T7", "C5", "C3", "C1", "Cz", "C2", "C4", "C6",
                "T8", "T10");
        for (int i = 1; i < coronal.size(); i++) {
            assertThat(angleDeg(coronal.get(i - 1), coronal.get(i))).isCloseTo(22.5, within(1e-9));
        }
    }

    @Test
    void equatorRingStepsAreEighteenDegrees() {
        // Jasper (1958) and ACNS (2006): the 10 % ring is divided into equal 10 % steps
        // (36° of the half circumference becomes 18° here).
        List<String> ring = List.of("Fpz", "Fp1", "AF7", "F7", "FT7", "T7", "TP7", "P7", "PO7",
                "O1", "Oz");
        for (int i = 1; i < ring.size(); i++) {
            assertThat(angleDeg(ring.get(i - 1), ring.get(i))).isCloseTo(18, within(1e-9));
            assertThat(at(ring.get(i)).z()).isCloseTo(0, within(1e-12));
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"AF", "F", "FC", "CP", "P", "PO"})
    void rowsAreDividedInEqualArcs(String row) {
        // Jasper (1958): positions along a row are equally spaced between the ring and the
        // midline (F7, F3, Fz); ACNS (2006) halves those steps (F7, F5, F3, F1, Fz).
        String ring = switch (row) {
            case "FC" -> "FT7";
            case "CP" -> "TP7";
            default -> row + "7";
        };
        List<String> labels = List.of(ring, row + "5", row + "3", row + "1", row + "z");
        double first = angleDeg(labels.get(0), labels.get(1));
        for (int i = 2; i < labels.size(); i++) {
            assertThat(angleDeg(labels.get(i - 1), labels.get(i))).isCloseTo(first, within(1e-9));
        }
        // and the row's three defining points and its others lie on one circle: equal arcs on
        // a circle give equal chords, checked above through the angles
    }

    @ParameterizedTest
    @EnumSource(StandardSystem.class)
    void everyPositionHasUnitLength(StandardSystem system) {
        for (Electrode e : system.montage().electrodes()) {
            double n = Math.sqrt(e.x() * e.x() + e.y() * e.y() + e.z() * e.z());
            assertThat(n).as(e.label()).isCloseTo(1.0, within(1e-12));
        }
    }

    @Test
    void leftAndRightHomologuesMirror() {
        // Jasper (1958): the system is symmetric about the midsagittal plane.
        for (Electrode e : TEN_FIVE.electrodes()) {
            if (Labels.isMidline(e.label())) {
                assertThat(e.x()).as(e.label()).isCloseTo(0, within(1e-12));
                continue;
            }
            Electrode h = at(Labels.homologue(e.label()).orElseThrow());
            assertThat(h.x()).as(e.label()).isCloseTo(-e.x(), within(1e-12));
            assertThat(h.y()).isCloseTo(e.y(), within(1e-12));
            assertThat(h.z()).isCloseTo(e.z(), within(1e-12));
            assertThat(Math.signum(e.x())).isEqualTo(Labels.side(e.label()));
        }
    }

    @Test
    void tenFiveHalvesEveryTenTenStep() {
        // Oostenveld & Praamstra (2001): 10-5 positions lie halfway between 10-10 positions,
        // columns between columns (C3h between C3 and C1) and rows between rows (FCC3 between
        // FC3 and C3).
        assertThat(angleDeg("C3", "C3h")).isCloseTo(angleDeg("C3h", "C1"), within(1e-9));
        assertThat(angleDeg("Cz", "FCCz")).isCloseTo(11.25, within(1e-9));
        assertThat(angleDeg("FCz", "FCCz")).isCloseTo(11.25, within(1e-9));
        assertThat(angleDeg("T7", "T7h")).isCloseTo(11.25, within(1e-9));
        assertThat(angleDeg("T9", "T9h")).isCloseTo(11.25, within(1e-9));
        assertThat(angleDeg("FTT7", "FT7")).isCloseTo(9, within(1e-9));
    }

    @Test
    void systemsHaveTheirSizesAndNest() {
        // Oostenveld & Praamstra (2001) give 345 positions for the 10-5 system (from memory).
        assertThat(StandardSystem.TEN_FIVE.montage().size()).isEqualTo(345);
        // Jasper's 19 positions plus Fpz and Oz
        assertThat(StandardSystem.TEN_TWENTY.montage().size()).isEqualTo(21);
        assertThat(StandardSystem.TEN_TEN.montage().size()).isEqualTo(85);
        for (StandardSystem small : List.of(StandardSystem.TEN_TWENTY, StandardSystem.TEN_TEN)) {
            for (Electrode e : small.montage().electrodes()) {
                assertThat(at(e.label())).isEqualTo(e);
            }
        }
    }

    @Test
    void tenTenNamesOfTheAcnsGuidelineArePresent() {
        // American Clinical Neurophysiology Society (2006), guideline on standard electrode
        // position nomenclature: the 10-10 names (from memory), T7/T8/P7/P8 replacing T3/T4/T5/T6.
        List<String> acns = List.of("Nz", "Fp1", "Fpz", "Fp2", "AF7", "AF3", "AFz", "AF4", "AF8",
                "F9", "F7", "F5", "F3", "F1", "Fz", "F2", "F4", "F6", "F8", "F10", "FT9", "FT7",
                "FC5", "FC3", "FC1", "FCz", "FC2", "FC4", "FC6", "FT8", "FT10", "T9", "T7", "C5",
                "C3", "C1", "Cz", "C2", "C4", "C6", "T8", "T10", "TP9", "TP7", "CP5", "CP3", "CP1",
                "CPz", "CP2", "CP4", "CP6", "TP8", "TP10", "P9", "P7", "P5", "P3", "P1", "Pz",
                "P2", "P4", "P6", "P8", "P10", "PO7", "PO3", "POz", "PO4", "PO8", "O1", "Oz", "O2",
                "Iz");
        Montage tenTen = StandardSystem.TEN_TEN.montage();
        for (String l : acns) {
            assertThat(tenTen.find(l)).as(l).isPresent();
            assertThat(tenTen.find(l).get().label()).isEqualTo(l);
        }
        assertThat(tenTen.find("T3")).isEmpty();
    }

    @Test
    void oldNamesAreAliasesOnInput() {
        // ACNS (2006): T3 → T7, T4 → T8, T5 → P7, T6 → P8.
        assertThat(Labels.aliasTarget("T3")).hasValue("T7");
        assertThat(Labels.aliasTarget("t4")).hasValue("T8");
        assertThat(Labels.aliasTarget("T5")).hasValue("P7");
        assertThat(Labels.aliasTarget("T6")).hasValue("P8");
        assertThat(Labels.standardPosition("T5").orElseThrow()).isEqualTo(at("P7"));
        assertThat(Labels.aliasTarget("T7")).isEmpty();
    }

    @ParameterizedTest
    @EnumSource(StandardSystem.class)
    void committedMontageFilesEqualTheGenerator(StandardSystem system) throws IOException {
        Path file = Path.of("montages", "standard-" + system.displayName() + ".tsv");
        String committed = Files.readString(file, StandardCharsets.UTF_8);
        assertThat(committed).isEqualTo(MontageWriter.toTsv(system.montage()));
    }

    @Test
    void labelsLookUpIgnoringCase() {
        assertThat(StandardSystem.find10_5("fcz").label()).isEqualTo("FCz");
        assertThat(StandardSystem.find10_5("AFF1H").label()).isEqualTo("AFF1h");
        assertThat(Labels.canonical("cpz")).isEqualTo("CPz");
    }
}
