package org.meridian.montage;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.meridian.core.Electrode;

/**
 * Electrode label rules of the 10-20 family: old names accepted as aliases on input, left/right
 * homologues, and a guess at the label a misspelt one was meant to be.
 *
 * <p>Odd numbers are on the left, even numbers on the right, {@code z} on the midline; a label's
 * homologue swaps odd and even numbers of the same row (F3 ↔ F4, FC5h ↔ FC6h, PO9 ↔ PO10).
 */
public final class Labels {
    /** Old 10-20 names and their ACNS (2006) equivalents. */
    private static final Map<String, String> ALIASES = Map.of("t3", "T7", "t4", "T8", "t5", "P7",
            "t6", "P8");
    private static final Pattern NUMBERED = Pattern.compile("^(.*?[A-Za-z])(\\d+)(h?)$");

    private Labels() {
    }

    /** The standard label an old name stands for (T3 → T7), if it is one. */
    public static Optional<String> aliasTarget(String label) {
        return Optional.ofNullable(ALIASES.get(label.trim().toLowerCase(Locale.ROOT)));
    }

    /** The standard 10-5 position of a label, directly or through an alias. */
    public static Optional<Electrode> standardPosition(String label) {
        Electrode e = StandardSystem.find10_5(label);
        if (e == null) {
            e = aliasTarget(label).map(StandardSystem::find10_5).orElse(null);
        }
        return Optional.ofNullable(e);
    }

    /** The canonical spelling of a standard label (fcz → FCz), or the label itself. */
    public static String canonical(String label) {
        Electrode e = StandardSystem.find10_5(label);
        return e == null ? label.trim() : e.label();
    }

    /** Whether a label is on the midline (ends in z). */
    public static boolean isMidline(String label) {
        return label.trim().toLowerCase(Locale.ROOT).endsWith("z");
    }

    /** -1 for a left label (odd number), +1 for right (even), 0 for midline or unnumbered. */
    public static int side(String label) {
        Matcher m = NUMBERED.matcher(label.trim());
        if (!m.matches()) {
            return 0;
        }
        return Integer.parseInt(m.group(2)) % 2 == 1 ? -1 : 1;
    }

    /**
     * The left/right homologue of a numbered label (F3 → F4, FC6h → FC5h, PO10 → PO9), keeping
     * the row and case; empty for midline and unnumbered labels. Old names map through their
     * aliases first (T3 → T8).
     */
    public static Optional<String> homologue(String label) {
        String l = aliasTarget(label).orElse(label.trim());
        Matcher m = NUMBERED.matcher(l);
        if (!m.matches()) {
            return Optional.empty();
        }
        int n = Integer.parseInt(m.group(2));
        int swapped = n % 2 == 1 ? n + 1 : n - 1;
        return Optional.of(m.group(1) + swapped + m.group(3));
    }

    /**
     * The standard label (or alias) closest to an unknown label, when it is close enough to be a
     * likely typo: at most one edit for short labels, two for labels of five or more characters.
     */
    public static Optional<String> likelyIntended(String label) {
        String wanted = label.trim().toLowerCase(Locale.ROOT);
        int limit = wanted.length() >= 5 ? 2 : 1;
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String candidate : StandardSystem.labels10_5()) {
            int d = editDistance(wanted, candidate.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = candidate;
            }
        }
        for (String alias : ALIASES.keySet()) {
            int d = editDistance(wanted, alias);
            if (d < bestDistance) {
                bestDistance = d;
                best = alias.toUpperCase(Locale.ROOT);
            }
        }
        return bestDistance <= limit ? Optional.of(best) : Optional.empty();
    }

    /** Levenshtein distance (insertions, deletions and substitutions each cost one). */
    public static int editDistance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(sub, Math.min(prev[j] + 1, cur[j - 1] + 1));
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
