/** The symbol palette, grouped by trade category, with search. */
package spoolwork.editor.palette;
