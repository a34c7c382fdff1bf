package org.meridian.signal;

import java.util.Collection;
import java.util.Locale;
import org.meridian.montage.Labels;

/**
 * The known name nearest to a mistyped one, for the "did you mean …?" part of an error,
 * ignoring case. A name that begins with what was written wins first: a shortened name is the
 * likeliest slip, even when another name is fewer edits away ({@code freq} → {@code frequent},
 * four insertions, rather than {@code rare}, three edits). Otherwise, and among several such
 * names, the least Levenshtein distance wins; on a tie a name that what was written begins with
 * ({@code rarex} → {@code rare}), then the first in the order given.
 */
public final class NearestName {
    private NearestName() {
    }

    /** The nearest of {@code names} to {@code written}; null when there are no names. */
    public static String among(String written, Collection<String> names) {
        String w = written.trim().toLowerCase(Locale.ROOT);
        String best = null;
        int bestRank = Integer.MAX_VALUE;
        int bestDistance = Integer.MAX_VALUE;
        for (String name : names) {
            String n = name.toLowerCase(Locale.ROOT);
            int rank = w.isEmpty() ? 2 : n.startsWith(w) ? 0 : w.startsWith(n) ? 1 : 2;
            int d = Labels.editDistance(w, n);
            boolean better = rank == 0 || bestRank == 0
                    ? rank < bestRank || (rank == bestRank && d < bestDistance)
                    : d < bestDistance || (d == bestDistance && rank < bestRank);
            if (better) {
                best = name;
                bestRank = rank;
                bestDistance = d;
            }
        }
        return best;
    }
}
