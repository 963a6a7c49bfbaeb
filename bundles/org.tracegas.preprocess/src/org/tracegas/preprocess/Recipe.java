package org.tracegas.preprocess;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

import org.tracegas.preprocess.internal.RecipeText;
import org.tracegas.spectrum.Spectrum;

/**
 * The ordered steps (id and parameters) that turn an input spectrum into a processed one. A recipe has one
 * canonical text form, so equal recipes give equal text, and parsing the text gives the recipe back.
 */
public final class Recipe {

    /** One step of a recipe: id and parameters, sorted by key. */
    public record Entry(String stepId, SortedMap<String, String> parameters) {

        /** @throws IllegalArgumentException if the id is blank or a parameter key or value is null */
        public Entry {
            if (stepId == null || stepId.isBlank()) {
                throw new IllegalArgumentException("recipe step id must not be blank");
            }
            if (parameters == null) {
                throw new IllegalArgumentException("parameters of step " + stepId + " must not be null");
            }
            parameters = Collections.unmodifiableSortedMap(new TreeMap<>(parameters));
        }
    }

    private final List<Entry> entries;

    private Recipe(List<Entry> entries) {
        this.entries = List.copyOf(entries);
    }

    /** A recipe of the given entries, in order. */
    public static Recipe of(List<Entry> entries) {
        if (entries == null) {
            throw new IllegalArgumentException("recipe entries must not be null");
        }
        return new Recipe(entries);
    }

    /** The recipe describing a list of steps. */
    public static Recipe describing(List<? extends SpectrumStep> steps) {
        List<Entry> list = new ArrayList<>();
        for (SpectrumStep s : steps) {
            list.add(new Entry(s.id(), s.parameters()));
        }
        return new Recipe(list);
    }

    /**
     * Applies steps in order and records them.
     *
     * @throws IllegalArgumentException if a step rejects its input
     */
    public static ProcessedSpectrum process(Spectrum input, List<? extends SpectrumStep> steps) {
        Spectrum current = input;
        for (SpectrumStep step : steps) {
            current = step.apply(current);
        }
        return new ProcessedSpectrum(current, describing(steps));
    }

    /**
     * Rebuilds a processed spectrum from its input, creating each step through the registry.
     *
     * @throws IllegalArgumentException if a step id is unknown to the registry or a parameter is rejected
     */
    public ProcessedSpectrum rebuild(Spectrum input, StepRegistry registry) {
        List<SpectrumStep> steps = new ArrayList<>();
        for (Entry e : entries) {
            steps.add(registry.create(e.stepId(), e.parameters()));
        }
        return process(input, steps);
    }

    public List<Entry> entries() {
        return entries;
    }

    /** The canonical text: a header line, then one line per step, "id key=value;key=value" with %-escapes. */
    public String toCanonicalString() {
        return RecipeText.format(entries);
    }

    /**
     * Parses a canonical text.
     *
     * @throws IllegalArgumentException naming the line and what is wrong with it
     */
    public static Recipe parse(String text) {
        return new Recipe(RecipeText.parse(text));
    }

    /** Convenience for building entries: a sorted copy of the map. */
    public static SortedMap<String, String> sorted(Map<String, String> parameters) {
        return Collections.unmodifiableSortedMap(new TreeMap<>(parameters));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Recipe r && entries.equals(r.entries);
    }

    @Override
    public int hashCode() {
        return entries.hashCode();
    }

    @Override
    public String toString() {
        return toCanonicalString();
    }
}
