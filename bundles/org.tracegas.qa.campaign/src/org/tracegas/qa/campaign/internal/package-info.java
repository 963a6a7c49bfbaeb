/**
 * The campaign's built-in QA checks, contributed to the extension point org.tracegas.qa.checks and named in QA
 * plans like any contributed check.
 */
package org.tracegas.qa.campaign.internal;
