/**
 * Line-by-line synthesis of reference spectra from HITRAN-format line lists: line intensities at the cell
 * temperature, Voigt profiles through the Faddeeva function, Beer-Lambert transmittance on a fine grid, the
 * instrument line shape, and decadic absorbance marked as synthetic.
 */
package org.tracegas.library.synthesis;
