/** The messages panel: drawing checks and notices, and later the calculation's findings. */
package spoolwork.editor.messages;
