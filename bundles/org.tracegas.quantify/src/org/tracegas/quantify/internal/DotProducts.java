package org.tracegas.quantify.internal;

/** Dot products of one vector with many: the one pass over a spectrum that a prepared fit makes per sample. */
final class DotProducts {

    private DotProducts() {
    }

    /**
     * out[k] = vectors[k] . y over the first {@code length} elements.
     * <p>
     * Four vectors at a time: four independent sums keep the processor busy, each in plain element order, so the
     * result does not depend on how many vectors there are.
     */
    static void of(double[][] vectors, double[] y, int length, double[] out) {
        int count = vectors.length;
        int k = 0;
        for (; k + 4 <= count; k += 4) {
            double[] u0 = vectors[k];
            double[] u1 = vectors[k + 1];
            double[] u2 = vectors[k + 2];
            double[] u3 = vectors[k + 3];
            double s0 = 0;
            double s1 = 0;
            double s2 = 0;
            double s3 = 0;
            for (int i = 0; i < length; i++) {
                double yi = y[i];
                s0 += u0[i] * yi;
                s1 += u1[i] * yi;
                s2 += u2[i] * yi;
                s3 += u3[i] * yi;
            }
            out[k] = s0;
            out[k + 1] = s1;
            out[k + 2] = s2;
            out[k + 3] = s3;
        }
        for (; k < count; k++) {
            double[] uk = vectors[k];
            double sum = 0;
            for (int i = 0; i < length; i++) {
                sum += uk[i] * y[i];
            }
            out[k] = sum;
        }
    }
}
