/**
 * ISO 1219-style symbols as data: every component type of the catalogue drawn from lines, arcs, circles,
 * polygons and text in grid units, with port anchors that match the model's ports, and an SVG writer.
 *
 * <p>Coordinates are grid units (one unit is the grid pitch, 2.5 mm on a 1:1 print), x to the right and y
 * down as on the sheet. A symbol is defined about its origin, which is always a grid point; port anchors
 * sit on grid points, on the outline of the symbol's bounding box, so that they stay on grid points under
 * rotation in 90° steps, mirroring and placement at a grid position. Angles are degrees measured from +x
 * towards +y, that is clockwise as seen on the sheet. Text is never rotated or mirrored: only its
 * reference point moves, so it stays upright.
 */
package spoolwork.symbols;
