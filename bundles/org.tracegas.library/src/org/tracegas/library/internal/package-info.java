/** Canonical serialization and hashing of reference spectra; not API. */
package org.tracegas.library.internal;
