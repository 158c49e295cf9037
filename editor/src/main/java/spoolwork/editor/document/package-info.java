/**
 * The open document and the selection. Views watch the coarse revision counters of each rather than
 * fields of the circuit; the document revision rises by one on every change, undo, redo and load.
 */
package spoolwork.editor.document;
