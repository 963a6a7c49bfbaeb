/**
 * Control charts for repeated QA checks (zero, span, CTS): Shewhart charts with Western Electric rules and
 * tabular CUSUM, as used for the ongoing quality assurance of automated measuring systems (EN 14181 QAL3).
 */
package org.tracegas.qa.control;
