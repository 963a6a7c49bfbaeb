/** Page layout, tables, plots and text handling of the PDF report; not API. */
package org.tracegas.report.internal;
