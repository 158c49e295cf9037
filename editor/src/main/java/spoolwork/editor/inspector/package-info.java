/**
 * The inspector: values of the selected item. Fields accept any unit of the quantity and show the chosen
 * unit system; the document holds SI values only. A value that does not parse or is out of range is
 * shown as an inline error and never reaches the document.
 */
package spoolwork.editor.inspector;
