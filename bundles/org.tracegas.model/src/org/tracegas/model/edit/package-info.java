/**
 * Changes to the workspace model as undoable commands, so that every edit in the workbench can be undone
 * and redone.
 */
package org.tracegas.model.edit;
