/**
 * Conversion of FTIR concentrations to a reporting basis (mass concentration at standard conditions,
 * dry gas, reference oxygen), averaging over periods with a minimum-data rule, and comparison with
 * emission limits.
 */
package org.tracegas.qa.basis;
