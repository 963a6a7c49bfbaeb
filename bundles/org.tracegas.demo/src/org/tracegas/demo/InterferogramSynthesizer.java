package org.tracegas.demo;

import java.util.Map;
import java.util.Random;

import org.tracegas.preprocess.FftEngine;
import org.tracegas.preprocess.RealFft;
import org.tracegas.spectrum.Interferogram;

/**
 * Makes the interferograms of the demo instrument from physics: the single beam of the source and detector
 * times the transmittance exp(-sum of c_i tau_i) of the gas in the cell, on a grid fine enough for the
 * line shapes, turned into an interferogram by a cosine transform and truncated at the maximum optical path
 * difference of the instrument. Detector noise and a DC level are added to the interferogram.
 */
final class InterferogramSynthesizer {

    private final int transformLength;
    private final int firstIndex;
    private final double[] envelope;
    private final Map<String, double[]> depthPerPpm;
    private final int halfPoints;

    /**
     * @param transformLength length of the fine cosine transform
     * @param firstIndex      grid index of the first value of the envelope and the depths
     * @param envelope        single beam of the empty cell on the fine grid
     * @param depthPerPpm     optical depth per ppm of each gas on the same grid
     * @param halfPoints      interferogram points on each side of the zero path difference
     */
    InterferogramSynthesizer(int transformLength, int firstIndex, double[] envelope, Map<String, double[]> depthPerPpm,
            int halfPoints) {
        this.transformLength = transformLength;
        this.firstIndex = firstIndex;
        this.envelope = envelope;
        this.depthPerPpm = depthPerPpm;
        this.halfPoints = halfPoints;
    }

    /**
     * @param ppm       concentration of each gas in the cell (gases not named are absent)
     * @param gain      throughput relative to the background (slow drifts of the source and the optics)
     * @param noiseRms  detector noise relative to the centre burst
     * @param random    noise source
     */
    Interferogram synthesize(Map<String, Double> ppm, double gain, double noiseRms, Random random) {
        double[] depth = new double[envelope.length];
        for (Map.Entry<String, Double> e : ppm.entrySet()) {
            double[] perPpm = depthPerPpm.get(e.getKey());
            if (perPpm == null) {
                throw new IllegalArgumentException("no optical depth for gas '" + e.getKey() + "'");
            }
            double c = e.getValue();
            for (int i = 0; i < depth.length; i++) {
                depth[i] += c * perPpm[i];
            }
        }
        double[] even = new double[transformLength];
        for (int i = 0; i < envelope.length; i++) {
            double v = gain * envelope[i] * Math.exp(-depth[i]);
            int k = firstIndex + i;
            even[k] = v;
            even[transformLength - k] = v;
        }
        RealFft fft = FftEngine.defaultEngine().create(transformLength);
        double[] re = new double[transformLength / 2 + 1];
        double[] im = new double[transformLength / 2 + 1];
        fft.forward(even, re, im);
        double burst = re[0];
        double[] samples = new double[2 * halfPoints];
        for (int i = 0; i < samples.length; i++) {
            samples[i] = re[Math.abs(i - halfPoints)] + 0.35 * burst + noiseRms * burst * random.nextGaussian();
        }
        return new Interferogram(samples, DemoScenario.LASER_WAVENUMBER, DemoScenario.SAMPLING_INTERVAL);
    }
}
