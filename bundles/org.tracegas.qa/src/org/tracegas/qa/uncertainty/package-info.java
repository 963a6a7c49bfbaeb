/**
 * Measurement uncertainty after the GUM (JCGM 100:2008): budgets of input components with sensitivity
 * coefficients, combined standard uncertainty by the law of propagation of uncertainty and expanded
 * uncertainty with a coverage factor.
 */
package org.tracegas.qa.uncertainty;
