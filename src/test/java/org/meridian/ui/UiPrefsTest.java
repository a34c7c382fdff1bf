package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class UiPrefsTest {
    @Test
    void recentStudiesKeepTheLatestFirstWithoutRepeatsUpToEight() {
        UiPrefs prefs = UiPrefs.inMemory();
        for (int i = 0; i < 10; i++) {
            prefs.opened(Path.of("/studies/s" + i));
        }
        prefs.opened(Path.of("/studies/s5"));
        assertThat(prefs.recentStudies()).hasSize(UiPrefs.RECENT);
        assertThat(prefs.recentStudies().get(0)).isEqualTo(Path.of("/studies/s5"));
        assertThat(prefs.recentStudies().get(1)).isEqualTo(Path.of("/studies/s9"));
        assertThat(prefs.recentStudies()).doesNotHaveDuplicates().doesNotContain(Path.of("/studies/s0"));
        assertThat(prefs.lastStudy()).contains(Path.of("/studies/s5"));
    }

    @Test
    void themeBoundsAndDividersComeBackAsSaved() {
        UiPrefs prefs = UiPrefs.inMemory();
        assertThat(prefs.theme()).isEqualTo(Theme.LIGHT);
        assertThat(prefs.windowBounds()).isEmpty();
        assertThat(prefs.divider("outer")).isEqualTo(-1);
        prefs.setTheme(Theme.DARK);
        prefs.setWindowBounds(10, 20, 1400, 900);
        prefs.setDivider("outer", 240);
        assertThat(prefs.theme()).isEqualTo(Theme.DARK);
        assertThat(prefs.windowBounds()).hasValueSatisfying(b -> assertThat(b).containsExactly(10, 20, 1400, 900));
        assertThat(prefs.divider("outer")).isEqualTo(240);
    }
}
