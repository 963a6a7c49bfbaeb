/**
 * Reference spectra as immutable values: compound, amount, cell state, instrument settings, origin and
 * uncertainty with each absorbance spectrum, and named libraries of them identified by a SHA-256 content hash.
 */
package org.tracegas.library;
