/**
 * The drawing sheet on screen. Positions on the sheet are grid units (one unit is the symbol grid pitch),
 * x to the right and y down, as in the model; a node's pixel position is grid units × {@link
 * spoolwork.editor.canvas.SheetView#PX} before zoom. Symbols are painted from the symbol library's data;
 * calculated values go on the overlay layer, keyed by component tag and line id.
 */
package spoolwork.editor.canvas;
