package org.tracegas.runner;

import java.util.Collection;
import java.util.Optional;

/**
 * The valid name closest to a mistyped one, for "did you mean" hints: by edit distance (insertions, deletions,
 * substitutions and swaps of neighbours, the optimal string alignment distance), within a third of the length.
 */
public final class NearestName {

    private NearestName() {
    }

    /** The closest of the names, if one is near enough to be a likely typo. */
    public static Optional<String> of(String typed, Collection<String> names) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String name : names) {
            int d = distance(typed, name);
            if (d < bestDistance) {
                best = name;
                bestDistance = d;
            }
        }
        return best != null && bestDistance <= Math.max(2, best.length() / 3) ? Optional.of(best) : Optional.empty();
    }

    /** The optimal string alignment distance: a swap of two neighbours counts as one edit. */
    static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }
}
