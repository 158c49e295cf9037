/**
 * Editing operations as commands over the immutable circuit. A command maps the circuit before to the
 * circuit after; the history keeps both, so undo and redo restore values equal to what they were.
 * Positions are grid units; parameter values are SI as in the model.
 */
package spoolwork.editor.commands;
