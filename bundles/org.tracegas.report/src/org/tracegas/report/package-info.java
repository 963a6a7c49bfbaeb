/**
 * Campaign reports: an immutable {@link org.tracegas.report.ReportContent} built from plain data, written as
 * PDF by {@link org.tracegas.report.PdfReportWriter} and as CSV by {@link org.tracegas.report.CsvExport}. The
 * same content always gives the same bytes, so a report can be made again from stored data alone.
 */
package org.tracegas.report;
