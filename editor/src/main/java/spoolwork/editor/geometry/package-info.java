/**
 * Sheet geometry and orthogonal line routing, in grid units with y down. No JavaFX here, so routing and
 * hit geometry are tested on their own.
 */
package spoolwork.editor.geometry;
