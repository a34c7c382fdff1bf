package org.meridian.signal;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class NearestNameTest {

    @Test
    void theFewestEditsWinIgnoringCase() {
        // Levenshtein distance (Levenshtein, 1966), counted by hand: "comon" is one insertion
        // from "common", five or more edits from the others
        assertThat(NearestName.among("comon", List.of("rare", "common", "frequent"))).isEqualTo("common");
        assertThat(NearestName.among("RARE", List.of("frequent", "rare"))).isEqualTo("rare");
        assertThat(NearestName.among("x", List.of())).isNull();
    }

    @Test
    void aShortenedNameWinsOverAFewerEditsOne() {
        // counted by hand: "freq" is 3 edits from "rare" (insert r, f→a, delete q) and 4 from
        // "frequent" (append uent); common practice: a name's beginning is the likelier slip
        assertThat(NearestName.among("freq", List.of("rare", "frequent"))).isEqualTo("frequent");
        // among several names with that beginning, the fewest edits
        assertThat(NearestName.among("go", List.of("go right", "go on"))).isEqualTo("go on");
    }

    @Test
    void tiesGoToANameThatWhatWasWrittenBeginsWithThenToTheFirst() {
        // counted by hand: "rarexy" is 2 edits from "rare" (delete x, y) and 2 from "bbrexy"
        // (r→b, a→b)
        assertThat(NearestName.among("rarexy", List.of("bbrexy", "rare"))).isEqualTo("rare");
        // "zz" is 2 substitutions from both
        assertThat(NearestName.among("zz", List.of("ab", "cd"))).isEqualTo("ab");
    }
}
