/**
 * Where placed components sit on the sheet, in grid units with y down; the routing of lines lives in
 * {@code spoolwork.symbols.routing}, shared with the SVG drawing. No JavaFX here, so hit geometry is tested
 * on its own.
 */
package spoolwork.editor.geometry;
