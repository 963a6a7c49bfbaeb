/** Small numerical helpers shared by the QA packages; not API. */
package org.tracegas.qa.internal;
