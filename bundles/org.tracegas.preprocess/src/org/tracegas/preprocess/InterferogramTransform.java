package org.tracegas.preprocess;

import java.util.LinkedHashMap;
import java.util.Map;

import org.tracegas.preprocess.internal.MertzPhase;
import org.tracegas.preprocess.internal.TransformWindow;
import org.tracegas.preprocess.internal.ZpdLocator;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;

/**
 * Interferogram to single-beam spectrum: DC removal, ZPD search, apodization (with the Mertz ramp for single-sided
 * recordings), zero filling, real FFT and phase correction. The wavenumber axis has the step
 * 1 / (transform length x sample spacing), the sample spacing being sampling interval / laser wavenumber.
 * <p>
 * An instance keeps its transform plan, apodization window and work buffers between calls, so a batch of
 * interferograms of one instrument setting is transformed without rebuilding them. Instances are not thread safe:
 * use one per thread. The returned spectra are immutable.
 */
public final class InterferogramTransform {

    /** Fewest samples on the short side of ZPD for a usable Mertz phase (common practice, no source). */
    static final int MIN_PHASE_SIDE = 8;
    private static final int WINDOW_CACHE_SIZE = 8;

    private record WindowKey(int shortSide, int longSide, double spacing) {
    }

    private final TransformSettings settings;
    private final FftEngine engine;
    private final MertzPhase phase;
    private final ZpdLocator zpdLocator = new ZpdLocator();
    private RealFft fft;
    private double[] buffer;
    private double[] re;
    private double[] im;
    /** Windows by short side, long side and spacing: the ZPD of an instrument wanders by a sample or two. */
    private final Map<WindowKey, TransformWindow> windows = new LinkedHashMap<>(16, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<WindowKey, TransformWindow> eldest) {
            return size() > WINDOW_CACHE_SIZE;
        }
    };
    private TransformWindow window;
    private double[] out = new double[0];
    private SpectralAxis axis;

    public InterferogramTransform(TransformSettings settings) {
        this(settings, FftEngine.defaultEngine());
    }

    /** @throws IllegalArgumentException if an argument is null */
    public InterferogramTransform(TransformSettings settings, FftEngine engine) {
        if (settings == null || engine == null) {
            throw new IllegalArgumentException("settings and engine must not be null");
        }
        this.settings = settings;
        this.engine = engine;
        this.phase = new MertzPhase(engine);
    }

    public TransformSettings settings() {
        return settings;
    }

    /**
     * A transform with the same settings and engine and work buffers of its own, for another thread: it gives
     * the same spectra bit for bit, since every call lays its buffers out anew.
     */
    public InterferogramTransform withOwnBuffers() {
        return new InterferogramTransform(settings, engine);
    }

    /**
     * The single-beam spectrum of an interferogram, on a wavenumber axis limited to the settings' range.
     *
     * @throws IllegalArgumentException if the interferogram is null, too short on the short side of ZPD for the
     *                                  chosen recording mode or phase correction, or the range holds no point
     */
    public Spectrum singleBeam(Interferogram interferogram) {
        if (interferogram == null) {
            throw new IllegalArgumentException("interferogram must not be null");
        }
        int size = layOut(interferogram);
        double dc = zpdLocator.dc();
        int zpd = zpdLocator.zpd();
        int direction = interferogram.size() - 1 - zpd >= zpd ? 1 : -1;
        int shortSide = Math.min(zpd, interferogram.size() - 1 - zpd);
        double spacing = interferogram.sampleSpacingCm();
        window.weigh(interferogram, dc, zpd, direction, buffer);
        fft.forward(buffer, re, im);

        double step = 1.0 / (size * spacing);
        int kLow = (int) Math.ceil(settings.lowWavenumber() / step);
        int kHigh = (int) Math.min(size / 2, Math.floor(settings.highWavenumber() / step));
        if (kHigh < kLow) {
            throw new IllegalArgumentException("wavenumber range " + settings.lowWavenumber() + " .. "
                    + settings.highWavenumber() + " cm-1 holds no point below the Nyquist wavenumber "
                    + interferogram.nyquistWavenumber() + " cm-1");
        }
        int count = kHigh - kLow + 1;
        if (out.length != count) {
            out = new double[count];
        }
        if (settings.phaseCorrection() == PhaseCorrection.MERTZ) {
            phase.measure(interferogram, dc, zpd, direction, Math.min(shortSide, settings.phasePoints() / 2));
            phase.correct(re, im, size, kLow, out);
        } else {
            for (int i = 0; i < count; i++) {
                int k = kLow + i;
                out[i] = Math.sqrt(re[k] * re[k] + im[k] * im[k]);
            }
        }
        if (axis == null || axis.size() != count || axis.first() != kLow * step || axis.step() != step) {
            axis = SpectralAxis.uniform(AxisUnit.WAVENUMBER, kLow * step, step, count);
        }
        return new Spectrum(axis, out, Ordinate.SINGLE_BEAM);
    }

    /**
     * How much the noise of neighbouring spectral points is correlated by this transform of an interferogram
     * (apodization, Mertz ramp, zero filling): F = N g(0)^2 / sum_j g_j^2 for the weights g_j of the samples and
     * the transform length N, the equivalent width of the noise autocorrelation (the Fourier transform of g^2)
     * in units of the point spacing. A least-squares fit over points whose model varies slowly on that width
     * that takes the points as independent understates the variance of its estimates by this factor: multiply
     * its standard uncertainties by sqrt(F). Without apodization or zero filling F = 1 (independent points);
     * zero filling by 2 doubles it; apodization raises it by 1 / mean(w^2); a single-sided recording whose
     * transform samples the spectrum more coarsely than its resolution gives F below 1. This is the factor the
     * quantitative fit takes from the transform of its spectra.
     *
     * @throws IllegalArgumentException as {@link #singleBeam} for an interferogram it cannot transform
     */
    public double noiseVarianceFactor(Interferogram interferogram) {
        if (interferogram == null) {
            throw new IllegalArgumentException("interferogram must not be null");
        }
        int size = layOut(interferogram);
        return window.noiseVarianceFactor(size);
    }

    /** Finds ZPD and the sides, prepares transform and window for them, and returns the transform length. */
    private int layOut(Interferogram interferogram) {
        int n = interferogram.size();
        zpdLocator.locate(interferogram, settings.zpdSearch(), settings.phasePoints() / 2);
        int zpd = zpdLocator.zpd();
        int before = zpd;
        int after = n - 1 - zpd;
        int shortSide = Math.min(before, after);
        int longSide = settings.sidedness() == Sidedness.DOUBLE_SIDED ? shortSide : Math.max(before, after);
        checkSides(zpd, n, shortSide, longSide);
        int size = settings.zeroFillFactor() * (Integer.highestOneBit(shortSide + longSide) << 1);
        prepare(size, shortSide, longSide, interferogram.sampleSpacingCm());
        return size;
    }

    private void checkSides(int zpd, int n, int shortSide, int longSide) {
        if (settings.phaseCorrection() == PhaseCorrection.MERTZ && shortSide < MIN_PHASE_SIDE) {
            throw new IllegalArgumentException("interferogram ZPD at sample " + zpd + " of " + n + " leaves "
                    + shortSide + " samples on its short side; Mertz phase correction needs at least "
                    + MIN_PHASE_SIDE + " (use the magnitude spectrum)");
        }
        if (longSide < 1) {
            throw new IllegalArgumentException("interferogram ZPD at sample " + zpd + " of " + n
                    + " leaves no samples for a " + settings.sidedness() + " transform");
        }
    }

    private void prepare(int size, int shortSide, int longSide, double spacing) {
        if (fft == null || fft.size() != size) {
            fft = engine.create(size);
            buffer = new double[size];
            re = new double[size / 2 + 1];
            im = new double[size / 2 + 1];
        }
        if (window == null || !window.fits(shortSide, longSide, spacing)) {
            window = windows.computeIfAbsent(new WindowKey(shortSide, longSide, spacing),
                    k -> new TransformWindow(settings.apodization(), settings.sidedness(), k.shortSide(), k.longSide(),
                            k.spacing()));
        }
    }
}
