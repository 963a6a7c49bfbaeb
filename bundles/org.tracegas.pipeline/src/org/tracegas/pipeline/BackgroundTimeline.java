package org.tracegas.pipeline;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.tracegas.preprocess.Background;

/** The backgrounds of a campaign in time order: each sample is ratioed against the last one taken before it. */
public final class BackgroundTimeline {

    private final List<Background> backgrounds;

    public BackgroundTimeline(List<Background> backgrounds) {
        if (backgrounds == null || backgrounds.isEmpty()) {
            throw new IllegalArgumentException("a campaign needs at least one background");
        }
        List<Background> sorted = new ArrayList<>(backgrounds);
        sorted.sort(Comparator.comparing(Background::measured));
        this.backgrounds = List.copyOf(sorted);
    }

    /**
     * @throws IllegalArgumentException if no background was taken before the time
     */
    public Background latestBefore(Instant time) {
        Background found = null;
        for (Background b : backgrounds) {
            if (b.measured().isAfter(time)) {
                break;
            }
            found = b;
        }
        if (found == null) {
            throw new IllegalArgumentException("no background before " + time + "; the first is from "
                    + backgrounds.get(0).measured());
        }
        return found;
    }

    public List<Background> all() {
        return backgrounds;
    }
}
