/** The editor window: menus, toolbar, panels and status bar around one document. */
package spoolwork.editor.window;
