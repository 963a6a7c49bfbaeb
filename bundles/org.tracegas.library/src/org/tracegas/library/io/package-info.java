/**
 * Reading reference libraries: the manifest format, and the {@link org.tracegas.library.io.ReferenceSpectrumSource}
 * through which each spectrum file is read (two-column text now, other formats such as JCAMP-DX by other sources).
 */
package org.tracegas.library.io;
