/** New, Open, Save and the questions asked before unsaved work would be lost. */
package spoolwork.editor.files;
