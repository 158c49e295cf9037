/** What the editor remembers between runs (unit system, recent files). */
package spoolwork.editor.settings;
