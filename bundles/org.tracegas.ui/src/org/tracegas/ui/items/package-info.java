/**
 * JFace viewers and the properties view over the workspace model's item providers (EMF.Edit): a tree's
 * content, its labels and a selected object's properties, each taken from the adapter factory the viewer is
 * given, so that every view shows a model object the same way.
 */
package org.tracegas.ui.items;
