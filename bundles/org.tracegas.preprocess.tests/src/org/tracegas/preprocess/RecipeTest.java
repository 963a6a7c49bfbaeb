package org.tracegas.preprocess;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class RecipeTest {

    private static final StepRegistry REGISTRY = StepRegistry.withBuiltInSteps();

    private static Spectrum highResolution() {
        SpectralAxis axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, 2000, 0.01, 20001);
        double[] v = new double[axis.size()];
        for (int i = 0; i < v.length; i++) {
            double s = axis.get(i);
            v[i] = 0.98 + 1e-5 * (s - 2000) - 0.4 * Math.exp(-Math.pow((s - 2143.27) / 0.08, 2))
                    - 0.2 * Math.exp(-Math.pow((s - 2100.11) / 0.08, 2));
        }
        return new Spectrum(axis, v, Ordinate.TRANSMITTANCE);
    }

    private static List<SpectrumStep> steps() {
        return List.of(
                REGISTRY.create("deresolve", Map.of("apodization", "NORTON_BEER_MEDIUM", "resolution", "0.5")),
                REGISTRY.create("shift", Map.of("offset", "0.0123")),
                REGISTRY.create("resample", Map.of("first", "2010.0", "step", "0.25", "size", "700")),
                REGISTRY.create("baseline", Map.of("degree", "1", "regions", "2010.0:2090.0,2160.0:2184.75")));
    }

    @Test
    void rebuildFromParsedTextGivesIdenticalDoubles() {
        Spectrum input = highResolution();
        ProcessedSpectrum made = Recipe.process(input, steps());
        String text = made.recipe().toCanonicalString();
        Recipe parsed = Recipe.parse(text);
        assertEquals(made.recipe(), parsed);
        assertEquals(text, parsed.toCanonicalString());
        ProcessedSpectrum rebuilt = parsed.rebuild(input, REGISTRY);
        assertArrayEquals(made.spectrum().toArray(), rebuilt.spectrum().toArray(), 0.0);
        assertEquals(made.spectrum(), rebuilt.spectrum());
        assertEquals(700, rebuilt.spectrum().size());
    }

    @Test
    void canonicalTextSortsParametersAndEscapesSpecialCharacters() {
        Recipe r = Recipe.of(List.of(new Recipe.Entry("custom step", Recipe.sorted(Map.of("z", "1", "a b", "x=y;%\u00e9")))));
        String text = r.toCanonicalString();
        assertEquals("recipe 1\ncustom%20step a%20b=x%3Dy%3B%25%C3%A9;z=1\n", text);
        assertEquals(r, Recipe.parse(text));
        assertEquals("recipe 1\n", Recipe.of(List.of()).toCanonicalString());
    }

    @Test
    void parseNamesTheBadLine() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Recipe.parse("recipe 1\nshift offset=1\nbaseline degree\n"));
        assertTrue(e.getMessage().startsWith("recipe line 3"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Recipe.parse("recipe 2\n"));
        assertTrue(e.getMessage().startsWith("recipe line 1"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Recipe.parse("recipe 1\nshift offset=1;offset=2\n"));
        assertTrue(e.getMessage().contains("twice"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Recipe.parse("recipe 1\nshift offset=%4\n"));
        assertTrue(e.getMessage().contains("bad escape"), e.getMessage());
    }

    @Test
    void unknownStepsAndParametersAreNamed() {
        Recipe r = Recipe.parse("recipe 1\nsmooth width=3\n");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> r.rebuild(highResolution(), REGISTRY));
        assertTrue(e.getMessage().contains("'smooth'") && e.getMessage().contains("baseline"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> REGISTRY.create("shift", Map.of("ofset", "1")));
        assertTrue(e.getMessage().contains("'ofset'"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> REGISTRY.create("deresolve", Map.of("apodization", "BOXCAR", "resolution", "-1")));
        assertTrue(e.getMessage().startsWith("step deresolve: nominalResolution"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> REGISTRY.create("resample",
                Map.of("first", "1", "step", "x", "size", "3")));
        assertTrue(e.getMessage().contains("'step' is not a number"), e.getMessage());
    }
}
