package org.meridian.montage;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;
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

    /** Every row between Fp and O, 10-10 and 10-5 alike (Oostenveld & Praamstra, 2001). */
    private static final List<String> GRID_ROWS = List.of("AFp", "AF", "AFF", "F", "FFC", "FC",
            "FCC", "C", "CCP", "CP", "CPP", "P", "PPO", "PO", "POO");

    static List<String> gridRows() {
        return GRID_ROWS;
    }

    /**
     * A row's positions on one side from its ring point to the midline: columns 7, 7h, 5, 5h, 3,
     * 3h, 1, 1h (or 8, 8h … 2h), then z. Columns 7 and 7h of the temporal rows take the temporal
     * prefix (FT7, TTP7h), as named by Oostenveld &amp; Praamstra (2001).
     */
    private static List<String> rowToMidline(String row, int side) {
        String outer = switch (row) {
            case "FFC" -> "FFT";
            case "FC" -> "FT";
            case "FCC" -> "FTT";
            case "C" -> "T";
            case "CCP" -> "TTP";
            case "CP" -> "TP";
            case "CPP" -> "TPP";
            default -> row;
        };
        List<String> out = new ArrayList<>();
        for (int column = 7; column >= 1; column -= 2) {
            String prefix = column == 7 ? outer : row;
            int number = side < 0 ? column : column + 1;
            out.add(prefix + number);
            out.add(prefix + number + "h");
        }
        out.add(row + "z");
        return out;
    }

    @ParameterizedTest
    @MethodSource("gridRows")
    void everyRowIsDividedInEqualArcsOnBothSides(String row) {
        // Jasper (1958): positions along a row are equally spaced between the ring and the
        // midline (F7, F3, Fz); ACNS (2006) halves those steps (F7, F5, F3, F1, Fz) and
        // Oostenveld & Praamstra (2001) halve them again (the h columns), in every 10-10 and 10-5
        // row. With the row on one circle (next test), equal chords mean equal arcs.
        for (int side : new int[] {-1, 1}) {
            List<String> labels = rowToMidline(row, side);
            assertThat(labels).hasSize(9);
            double first = angleDeg(labels.get(0), labels.get(1));
            for (int i = 2; i < labels.size(); i++) {
                assertThat(angleDeg(labels.get(i - 1), labels.get(i)))
                        .as(labels.get(i - 1) + "–" + labels.get(i)).isCloseTo(first, within(1e-9));
            }
        }
    }

    @ParameterizedTest
    @MethodSource("gridRows")
    void everyRowLiesInThePlaneOfItsRingPointsAndMidlinePoint(String row) {
        // Jasper (1958): a row runs along one arc from the left ring point over the midline
        // point to the right ring point; a circle on a sphere is its cut with a plane (textbook
        // geometry), so every position of the row lies in the plane through those three.
        List<String> left = rowToMidline(row, -1);
        List<String> right = rowToMidline(row, 1);
        Electrode a = at(left.get(0));
        Electrode m = at(row + "z");
        Electrode b = at(right.get(0));
        double[] u = {m.x() - a.x(), m.y() - a.y(), m.z() - a.z()};
        double[] v = {b.x() - a.x(), b.y() - a.y(), b.z() - a.z()};
        double[] n = {u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]};
        double length = Math.sqrt(n[0] * n[0] + n[1] * n[1] + n[2] * n[2]);
        List<String> all = new ArrayList<>(left);
        all.addAll(right);
        for (String l : all) {
            Electrode e = at(l);
            double distance = (n[0] * (e.x() - a.x()) + n[1] * (e.y() - a.y()) + n[2] * (e.z() - a.z()))
                    / length;
            assertThat(distance).as(l).isCloseTo(0, within(1e-12));
        }
    }

    @Test
    void theGeneratorPlacesEveryPointOnTheUnitSphere() {
        // The head is modelled as a sphere of radius 1 (Jasper, 1958, places every position on
        // the head's surface): x² + y² + z² = 1, checked on the computed points before the
        // Electrode constructor normalises them.
        for (String label : StandardSystem.labels10_5()) {
            double[] p = StandardSystem.rawPoint(label);
            double n = Math.sqrt(p[0] * p[0] + p[1] * p[1] + p[2] * p[2]);
            assertThat(n).as(label).isCloseTo(1.0, within(1e-12));
        }
        assertThat(StandardSystem.labels10_5()).hasSize(345);
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
        // the old names pair within their own naming and mirror too (ACNS 2006: T3 = T7,
        // T4 = T8, T5 = P7, T6 = P8)
        for (String old : List.of("T3", "T4", "T5", "T6")) {
            Electrode e = Labels.standardPosition(old).orElseThrow();
            Electrode h = Labels.standardPosition(Labels.homologue(old).orElseThrow()).orElseThrow();
            assertThat(h.x()).as(old).isCloseTo(-e.x(), within(1e-12));
            assertThat(h.y()).isCloseTo(e.y(), within(1e-12));
            assertThat(h.z()).isCloseTo(e.z(), within(1e-12));
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
