package org.tracegas.store.internal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.tracegas.store.SampleEncoding;

class SpectrumCodecTest {

    @Test
    void float64IsLittleEndianIeee754() {
        // 1.0 = 0x3FF0000000000000, -2.0 = 0xC000000000000000 (IEEE 754-2019, binary64)
        byte[] bytes = SpectrumCodec.encode(new double[] {1.0, -2.0}, SampleEncoding.FLOAT64_LE);
        assertArrayEquals(new byte[] {0, 0, 0, 0, 0, 0, (byte) 0xF0, 0x3F, 0, 0, 0, 0, 0, 0, 0, (byte) 0xC0}, bytes);
        assertArrayEquals(new double[] {1.0, -2.0},
                SpectrumCodec.decode(bytes, SampleEncoding.FLOAT64_LE, 2, "test"));
    }

    @Test
    void float32IsLittleEndianIeee754() {
        // 1.0f = 0x3F800000 (IEEE 754-2019, binary32)
        byte[] bytes = SpectrumCodec.encode(new double[] {1.0}, SampleEncoding.FLOAT32_LE);
        assertArrayEquals(new byte[] {0, 0, (byte) 0x80, 0x3F}, bytes);
        assertEquals(0.1f, SpectrumCodec.decode(SpectrumCodec.encode(new double[] {0.1}, SampleEncoding.FLOAT32_LE),
                SampleEncoding.FLOAT32_LE, 1, "test")[0], 0.0);
    }

    @Test
    void wrongLengthIsReportedWithTheArrayName() {
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> SpectrumCodec.decode(new byte[12], SampleEncoding.FLOAT64_LE, 2, "spectrum 42"));
        assertTrue(e.getMessage().contains("spectrum 42") && e.getMessage().contains("12 bytes"), e.getMessage());
    }

    @Test
    void sha256MatchesTheFipsExample() {
        // FIPS 180-2, Appendix B.1: SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                SpectrumCodec.sha256Hex("abc".getBytes(StandardCharsets.US_ASCII)));
    }
}
