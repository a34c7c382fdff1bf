package org.meridian.montage;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meridian.core.Montage;

class NeighboursTest {
    private static List<String> neighboursOf(Montage m, String label) {
        Neighbours n = Neighbours.of(m);
        int i = m.labels().indexOf(label);
        List<String> out = new ArrayList<>();
        for (int j : n.of(i)) {
            out.add(m.labels().get(j));
        }
        return out;
    }

    @Test
    void czTouchesItsFourDirectNeighboursInTenTwenty() {
        // common practice: on the 10-20 grid, Cz's nearest positions are Fz, Pz, C3 and C4.
        List<String> n = neighboursOf(StandardSystem.TEN_TWENTY.montage(), "Cz");
        assertThat(n).contains("Fz", "Pz", "C3", "C4").doesNotContain("O1", "Fp1", "T7");
    }

    @Test
    void adjacencyIsSymmetricAndEveryoneHasNeighbours() {
        for (StandardSystem sys : StandardSystem.values()) {
            Montage m = sys.montage();
            Neighbours n = Neighbours.of(m);
            for (int i = 0; i < m.size(); i++) {
                assertThat(n.of(i)).as(sys + " " + m.labels().get(i)).hasSizeGreaterThanOrEqualTo(2);
                for (int j : n.of(i)) {
                    assertThat(n.adjacent(j, i)).isTrue();
                }
            }
        }
    }

    @Test
    void delaunayOfAQuadrilateralTakesTheDiagonalWithEmptyCircumcircles() {
        // Delaunay (1934): no point lies inside a triangle's circumcircle. For A(0,0), B(1,0),
        // C(1,1.1), D(0,1) (not on one circle, so the answer is unique) the circle through A, B,
        // C has AC as its diameter (right angle at B) and holds D, so the diagonal is BD:
        // triangles ABD and BCD.
        List<int[]> t = Neighbours.triangulate(new double[][] {{0, 0}, {1, 0}, {1, 1.1}, {0, 1}});
        List<String> sorted = new ArrayList<>();
        for (int[] tri : t) {
            int[] s = tri.clone();
            java.util.Arrays.sort(s);
            sorted.add(java.util.Arrays.toString(s));
        }
        assertThat(sorted).containsExactlyInAnyOrder("[0, 1, 3]", "[1, 2, 3]");
    }

    @Test
    void rimElectrodesAreNotJoinedAcrossTheHead() {
        List<String> n = neighboursOf(StandardSystem.TEN_TEN.montage(), "T7");
        assertThat(n).doesNotContain("T8", "Oz", "Fpz");
        assertThat(n).contains("C5");
    }
}
