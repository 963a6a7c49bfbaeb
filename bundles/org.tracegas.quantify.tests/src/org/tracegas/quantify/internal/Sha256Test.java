package org.tracegas.quantify.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

class Sha256Test {

    /** FIPS 180-2, appendix B.1: SHA-256("abc"). */
    @Test
    void matchesFipsExample() {
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                Sha256.hex("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    /** The spectrum digest is the digest of count, axis bits and value bits, big-endian, as documented. */
    @Test
    void spectrumDigestCoversCountAxisAndValueBits() {
        Spectrum s = new Spectrum(SpectralAxis.of(AxisUnit.WAVENUMBER, 1000.0, 1000.5), new double[] {-0.0, 0.25},
                Ordinate.ABSORBANCE);
        java.nio.ByteBuffer b = java.nio.ByteBuffer.allocate(8 * 5);
        b.putLong(2).putDouble(1000.0).putDouble(1000.5).putLong(Double.doubleToRawLongBits(-0.0)).putDouble(0.25);
        assertEquals(Sha256.hex(b.array()), Sha256.ofSpectrum(s));
        Spectrum positiveZero = s.withValues(new double[] {0.0, 0.25}, Ordinate.ABSORBANCE);
        org.junit.jupiter.api.Assertions.assertNotEquals(Sha256.ofSpectrum(s), Sha256.ofSpectrum(positiveZero));
        Sha256.SpectrumHasher hasher = new Sha256.SpectrumHasher(s.axis());
        assertEquals(Sha256.ofSpectrum(s), hasher.hash(s));
        assertEquals(Sha256.ofSpectrum(positiveZero), hasher.hash(positiveZero));
        Spectrum otherAxis = new Spectrum(SpectralAxis.of(AxisUnit.WAVENUMBER, 1000.0, 1001.0), new double[] {0, 1},
                Ordinate.ABSORBANCE);
        assertEquals(Sha256.ofSpectrum(otherAxis), hasher.hash(otherAxis));
    }
}
