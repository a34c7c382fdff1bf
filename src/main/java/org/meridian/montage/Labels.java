package org.meridian.montage;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.meridian.core.Electrode;

/**
 * Electrode label rules of the 10-20 family: old names accepted as aliases on input, left/right
 * homologues, and a guess at the label a misspelt one was meant to be.
 *
 * <p>Odd numbers are on the left, even numbers on the right, {@code z} on the midline (American
 * Clinical Neurophysiology Society guideline, 2006). That rule holds for the 10-5 names only: a
 * numbered label outside them (E17 of a geodesic net, EXG1, HEOG2) says nothing about its side,
 * so only labels with a standard 10-5 position, directly or through an old name, have a side and a
 * homologue. A homologue swaps odd and even numbers of the same row (F3 ↔ F4, FC5h ↔ FC6h,
 * PO9 ↔ PO10), and old names pair within the old naming (T3 ↔ T4, T5 ↔ T6), so a study labelled
 * in either naming keeps its pairs.
 *
 * <p>Typo guesses aim only at positions found on real caps: the 10-5 names without the rows
 * below the 10 % ring (N, NFp, OI, I; Nz and Iz stay), plus the old names. Reference and
 * non-scalp channels (earlobes A1/A2, mastoids M1/M2, EOG, ECG, EMG, external and status
 * channels) are recognised and get no guess, since "M1" is no misspelling of "C1"; nor do a
 * geodesic net's numbered channels (E1 … E256).
 */
public final class Labels {
    /** Old 10-20 names and their ACNS (2006) equivalents. */
    private static final Map<String, String> ALIASES = Collections.unmodifiableMap(
            new TreeMap<>(Map.of("t3", "T7", "t4", "T8", "t5", "P7", "t6", "P8")));
    private static final Pattern NUMBERED = Pattern.compile("^(.*?[A-Za-z])(\\d+)(h?)$");
    /** Rows below the 10 % ring that few caps carry: never offered as a typo's target. */
    private static final Pattern RARE_ROW = Pattern.compile("^(n|nfp|oi|i)(\\d+h?)$");
    /**
     * Conventional names of reference and non-scalp channels (common practice): earlobes,
     * mastoids, nose, ground and reference, ocular electrodes (lateral, infra- and supra-orbital),
     * and anything naming EOG, ECG/EKG, EMG, respiration, skin response, an external input or the
     * trigger/status channel.
     */
    private static final Pattern NON_SCALP = Pattern.compile(
            "^(a[12]|m[12]|lm|rm|nose|ref|gnd|ground|[lis]o[12]|exg\\d*|ext\\d*|aux\\d*|status|trig(ger)?\\d*"
                    + "|resp\\w*|gsr\\w*)$|eog|ecg|ekg|emg");
    /** A geodesic net's channel numbering (E1 … E256): scalp channels, but no misspelt 10-5 names. */
    private static final Pattern NET_NUMBER = Pattern.compile("^e\\d+$");
    private static final List<String> TYPO_TARGETS = typoTargets();

    private Labels() {
    }

    /** The standard label an old name stands for (T3 → T7), if it is one. */
    public static Optional<String> aliasTarget(String label) {
        return Optional.ofNullable(ALIASES.get(label.trim().toLowerCase(Locale.ROOT)));
    }

    /**
     * Every name of the position a label stands for, the label itself first: T3 → [T3, T7],
     * T7 → [T7, T3], Fz → [Fz].
     */
    public static List<String> spellings(String label) {
        String l = label.trim();
        List<String> out = new ArrayList<>(List.of(l));
        aliasTarget(l).ifPresent(out::add);
        for (Map.Entry<String, String> alias : ALIASES.entrySet()) {
            if (alias.getValue().equalsIgnoreCase(l)) {
                out.add(alias.getKey().toUpperCase(Locale.ROOT));
            }
        }
        return out;
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

    /**
     * -1 for a standard label on the left (odd number; T3 and T5 too), +1 on the right (even),
     * 0 for the midline and for every label without a standard position (E17, EXG1, HEOG).
     */
    public static int side(String label) {
        Optional<Electrode> e = standardPosition(label);
        if (e.isEmpty() || !NUMBERED.matcher(label.trim()).matches()) {
            return 0;
        }
        return (int) Math.signum(e.get().x());
    }

    /**
     * The left/right homologue of a standard numbered label (F3 → F4, FC6h → FC5h, PO10 → PO9),
     * keeping the row and case; old names stay in the old naming (T3 → T4, T6 → T5). Empty for
     * midline labels and for labels without a standard position.
     */
    public static Optional<String> homologue(String label) {
        String l = label.trim();
        Matcher m = NUMBERED.matcher(l);
        if (standardPosition(l).isEmpty() || !m.matches()) {
            return Optional.empty();
        }
        int n = Integer.parseInt(m.group(2));
        int swapped = n % 2 == 1 ? n + 1 : n - 1;
        return Optional.of(m.group(1) + swapped + m.group(3));
    }

    /** Whether a label is a conventional name of a reference or non-scalp channel (A1, M2, VEOG, ECG). */
    public static boolean isNonScalp(String label) {
        return NON_SCALP.matcher(label.trim().toLowerCase(Locale.ROOT)).find();
    }

    /**
     * The standard label (or alias) closest to an unknown label, when it is close enough to be a
     * likely typo: at most one edit for short labels, two for labels of five or more characters.
     * Reference and non-scalp channels ({@link #isNonScalp}) and a geodesic net's numbered
     * channels (E3 is no slip for F3) get no guess.
     */
    public static Optional<String> likelyIntended(String label) {
        if (isNonScalp(label) || NET_NUMBER.matcher(label.trim().toLowerCase(Locale.ROOT)).matches()) {
            return Optional.empty();
        }
        return nearest(label, TYPO_TARGETS);
    }

    /**
     * The candidate closest to a label (ignoring case) when it is close enough to be a likely
     * typo: at most one edit for labels shorter than five characters, two for longer ones; the
     * first of equally close candidates.
     */
    public static Optional<String> nearest(String label, Collection<String> candidates) {
        String wanted = label.trim().toLowerCase(Locale.ROOT);
        int limit = wanted.length() >= 5 ? 2 : 1;
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String candidate : candidates) {
            int d = editDistance(wanted, candidate.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = candidate;
            }
        }
        return bestDistance <= limit ? Optional.of(best) : Optional.empty();
    }

    private static List<String> typoTargets() {
        List<String> out = new ArrayList<>();
        for (String l : StandardSystem.labels10_5()) {
            if (!RARE_ROW.matcher(l.toLowerCase(Locale.ROOT)).matches()) {
                out.add(l);
            }
        }
        for (String alias : ALIASES.keySet()) {
            out.add(alias.toUpperCase(Locale.ROOT));
        }
        return List.copyOf(out);
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
