package lamella.api;

import java.util.Collection;
import java.util.Optional;

/** Spelling help for error messages: the known name closest to a mistyped one. */
public final class Names {

    private Names() {
    }

    /** The candidate within edit distance 3 (and less than half the length) of {@code typed}, if any. */
    public static Optional<String> closest(String typed, Collection<String> candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String c : candidates) {
            int d = distance(typed, c);
            if (d < bestDistance) {
                bestDistance = d;
                best = c;
            }
        }
        if (best != null && bestDistance <= 3 && bestDistance * 2 < Math.max(typed.length(), 2)) {
            return Optional.of(best);
        }
        return Optional.empty();
    }

    static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
