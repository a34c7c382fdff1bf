package org.meridian.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;

/**
 * What the window remembers between runs, in {@code java.util.prefs} under the user node
 * {@code org/meridian/ui}: the last study, up to {@value #RECENT} recent studies, the theme, the
 * window's bounds and the positions of its dividers. On Linux the user node lives in
 * {@code ~/.java/.userPrefs/org/meridian/ui/prefs.xml}; on Windows in the registry under
 * {@code HKEY_CURRENT_USER\Software\JavaSoft\Prefs}; on macOS in
 * {@code ~/Library/Preferences/com.apple.java.util.prefs.plist}.
 *
 * <p>Tests pass another node so they never touch the researcher's own settings.
 */
public final class UiPrefs {
    /** How many recent studies File → Recent lists. */
    public static final int RECENT = 8;
    private static final String LAST = "lastStudy";
    private static final String RECENT_KEY = "recent.";
    private static final String THEME = "theme";
    private static final String BOUNDS = "windowBounds";
    private static final String DIVIDER = "divider.";

    private final Preferences node;

    public UiPrefs(Preferences node) {
        this.node = node;
    }

    /** The researcher's own settings. */
    public static UiPrefs user() {
        return new UiPrefs(Preferences.userRoot().node("org/meridian/ui"));
    }

    /** Settings kept in memory only (nothing is read or written): for tests and demos. */
    public static UiPrefs inMemory() {
        return new UiPrefs(new MemoryPreferences());
    }

    public Optional<Path> lastStudy() {
        String s = node.get(LAST, null);
        return s == null ? Optional.empty() : Optional.of(Path.of(s));
    }

    /** Most recent first. */
    public List<Path> recentStudies() {
        List<Path> out = new ArrayList<>();
        for (int i = 0; i < RECENT; i++) {
            String s = node.get(RECENT_KEY + i, null);
            if (s != null) {
                out.add(Path.of(s));
            }
        }
        return out;
    }

    /** Records a study as opened: it becomes the last study and heads the recent list. */
    public void opened(Path study) {
        Path p = study.toAbsolutePath().normalize();
        List<Path> recent = recentStudies();
        recent.remove(p);
        recent.add(0, p);
        node.put(LAST, p.toString());
        for (int i = 0; i < RECENT; i++) {
            if (i < recent.size()) {
                node.put(RECENT_KEY + i, recent.get(i).toString());
            } else {
                node.remove(RECENT_KEY + i);
            }
        }
        flush();
    }

    public Theme theme() {
        return Theme.parse(node.get(THEME, Theme.LIGHT.name()));
    }

    public void setTheme(Theme t) {
        node.put(THEME, t.name());
        flush();
    }

    /** x, y, width, height, or empty when never saved. */
    public Optional<int[]> windowBounds() {
        String s = node.get(BOUNDS, null);
        if (s == null) {
            return Optional.empty();
        }
        String[] parts = s.split(",");
        if (parts.length != 4) {
            return Optional.empty();
        }
        int[] b = new int[4];
        try {
            for (int i = 0; i < 4; i++) {
                b[i] = Integer.parseInt(parts[i].trim());
            }
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
        return Optional.of(b);
    }

    public void setWindowBounds(int x, int y, int width, int height) {
        node.put(BOUNDS, x + "," + y + "," + width + "," + height);
    }

    /** A divider's position in pixels, or -1 when never saved. */
    public int divider(String name) {
        return node.getInt(DIVIDER + name, -1);
    }

    public void setDivider(String name, int position) {
        node.putInt(DIVIDER + name, position);
    }

    public void flush() {
        try {
            node.flush();
        } catch (BackingStoreException | IllegalStateException e) {
            // preferences are a convenience: a read-only home must not stop the window
        }
    }
}
