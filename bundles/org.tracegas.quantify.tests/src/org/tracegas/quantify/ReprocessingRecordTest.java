package org.tracegas.quantify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.Spectrum;

class ReprocessingRecordTest {

    /** Same inputs and versions: identical record and bit-identical numbers, also from a freshly built method. */
    @Test
    void sameInputsAndVersionsGiveIdenticalResults() {
        Spectrum sample = Mixture.noisy(Mixture.clean(Mixture.TRUTH), new Random(31));
        SpectrumResult first = new Quantifier(PreparedMethod.prepare(Mixture.method().build(), SyntheticGas.AXIS),
                "library-sha-1", "1.4.2", true).quantify(Sample.of(sample));
        SpectrumResult again = new Quantifier(PreparedMethod.prepare(Mixture.method().build(), SyntheticGas.AXIS),
                "library-sha-1", "1.4.2", true).quantify(Sample.of(new Spectrum(sample.axis(), sample.toArray(),
                        sample.ordinate())));
        assertEquals(first, again);
        assertEquals(Mixture.method().build().contentHash(), first.record().methodHash());
        assertEquals("library-sha-1", first.record().libraryHash());
        assertEquals("1.4.2", first.record().softwareVersion());
        assertEquals(64, first.record().inputHash().length());
    }

    /** One unit in the last place of one absorbance value changes the input hash. */
    @Test
    void inputHashSeesEveryBit() {
        Spectrum sample = Mixture.noisy(Mixture.clean(Mixture.TRUTH), new Random(32));
        double[] v = sample.toArray();
        v[1234] = Math.nextUp(v[1234]);
        Quantifier q = new Quantifier(PreparedMethod.prepare(Mixture.method().build(), SyntheticGas.AXIS), "l", "v",
                false);
        assertNotEquals(q.quantify(Sample.of(sample)).record().inputHash(),
                q.quantify(Sample.of(sample.withValues(v, sample.ordinate()))).record().inputHash());
    }

    @Test
    void refusesBlankFields() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ReprocessingRecord("m", " ", "v", "i"))
                .getMessage().startsWith("libraryHash"));
        PreparedMethod p = PreparedMethod.prepare(Mixture.method().build(), SyntheticGas.AXIS);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new Quantifier(p, "l", "", false))
                .getMessage().startsWith("softwareVersion"));
    }
}
