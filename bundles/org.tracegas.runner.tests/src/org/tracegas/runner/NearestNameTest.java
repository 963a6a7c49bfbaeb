package org.tracegas.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

class NearestNameTest {

    /**
     * Optimal string alignment distances worked by hand from the definition (Damerau's four edits, each
     * substring edited once): a swap of neighbours is one edit, and "ca" to "abc" is 3, not the 2 of the
     * unrestricted Damerau-Levenshtein distance (the usual textbook contrast between the two).
     */
    @Test
    void distanceCountsInsertionsDeletionsSubstitutionsAndSwaps() {
        assertEquals(0, NearestName.distance("--file", "--file"));
        assertEquals(1, NearestName.distance("--flie", "--file"));
        assertEquals(1, NearestName.distance("--fil", "--file"));
        assertEquals(3, NearestName.distance("kitten", "sitting"));
        assertEquals(3, NearestName.distance("ca", "abc"));
    }

    @Test
    void nearestNameOnlyWhenCloseEnough() {
        List<String> options = List.of("--workspace", "--as", "--project", "--file");
        assertEquals(Optional.of("--file"), NearestName.of("--flie", options));
        assertEquals(Optional.of("--workspace"), NearestName.of("--worksapce", options));
        assertEquals(Optional.empty(), NearestName.of("--colour", options));
    }
}
