/**
 * Orthogonal routing of circuit lines around symbol outlines, in sheet grid units with y down. One router
 * serves the editor, the SVG drawing and code that writes circuits, so a line looks the same everywhere.
 * An exit direction is a unit step (±1, 0) or (0, ±1) pointing away from the symbol.
 */
package spoolwork.symbols.routing;
