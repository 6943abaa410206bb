// Keyboard shortcuts: one table, used both to dispatch keys and to fill the help panel.

import { escapeHtml } from '../runtime/present/escape';

export type Command =
  | 'next' | 'prev' | 'edit' | 'editFull' | 'moveUp' | 'moveDown' | 'duplicate' | 'delete'
  | 'addInput' | 'addFormula' | 'addCheck' | 'addNote' | 'addSection'
  | 'undo' | 'redo' | 'units' | 'templates' | 'print' | 'help' | 'summary';

export interface Shortcut {
  keys: string[];
  command: Command;
  what: string;
  /** Also works while typing in a field (otherwise the field keeps the key). */
  global?: boolean;
}

export const SHORTCUTS: Shortcut[] = [
  { keys: ['ArrowDown'], command: 'next', what: 'Select the next cell' },
  { keys: ['ArrowUp'], command: 'prev', what: 'Select the previous cell' },
  { keys: ['Enter'], command: 'edit', what: 'Edit the selected cell (an input: its value, in place)' },
  { keys: ['e'], command: 'editFull', what: 'Open the full editor of the selected cell (name, unit, label, reference)' },
  { keys: ['Alt+ArrowUp'], command: 'moveUp', what: 'Move the selected cell up' },
  { keys: ['Alt+ArrowDown'], command: 'moveDown', what: 'Move the selected cell down' },
  { keys: ['d'], command: 'duplicate', what: 'Duplicate the selected cell' },
  { keys: ['Delete'], command: 'delete', what: 'Delete the selected cell (undo brings it back)' },
  { keys: ['i'], command: 'addInput', what: 'Add an input below' },
  { keys: ['f'], command: 'addFormula', what: 'Add a formula below' },
  { keys: ['c'], command: 'addCheck', what: 'Add a check below' },
  { keys: ['t'], command: 'addNote', what: 'Add a note (text) below' },
  { keys: ['h'], command: 'addSection', what: 'Add a section heading below' },
  { keys: ['Ctrl+z'], command: 'undo', what: 'Undo', global: true },
  { keys: ['Ctrl+Shift+z', 'Ctrl+y'], command: 'redo', what: 'Redo', global: true },
  { keys: ['u'], command: 'units', what: 'Switch display units US ↔ SI' },
  { keys: ['s'], command: 'summary', what: 'Go to the summary of checks' },
  { keys: ['n'], command: 'templates', what: 'New sheet from a template' },
  { keys: ['p'], command: 'print', what: 'Print' },
  { keys: ['?'], command: 'help', what: 'Show or hide this list' },
];

/** The key as written in the table, e.g. "Ctrl+Shift+z", "Alt+ArrowUp", "?". */
export function keyName(e: KeyboardEvent): string {
  const parts: string[] = [];
  if (e.ctrlKey || e.metaKey) parts.push('Ctrl');
  if (e.altKey) parts.push('Alt');
  const printable = e.key.length === 1;
  if (e.shiftKey && !(printable && !e.ctrlKey && !e.metaKey)) parts.push('Shift');
  parts.push(printable ? e.key.toLowerCase() === e.key || e.ctrlKey || e.metaKey ? e.key.toLowerCase() : e.key : e.key);
  return parts.join('+');
}

export function commandFor(e: KeyboardEvent, inField: boolean): Command | undefined {
  const name = keyName(e);
  const hit = SHORTCUTS.find((s) => s.keys.includes(name));
  if (!hit) return undefined;
  if (inField && !hit.global) return undefined;
  return hit.command;
}

function keyLabel(k: string): string {
  return k.replace('ArrowUp', '↑').replace('ArrowDown', '↓').replace(/\+/g, ' + ');
}

export function helpHtml(): string {
  const rows = SHORTCUTS.map((s) => `<tr><td>${s.keys.map((k) => `<kbd>${escapeHtml(keyLabel(k))}</kbd>`).join(' or ')}</td><td>${escapeHtml(s.what)}</td></tr>`);
  return `<h2>Keyboard</h2><table class="keys">${rows.join('')}</table>
<h3>While editing</h3><table class="keys">
<tr><td><kbd>Enter</kbd></td><td>Apply an input value</td></tr>
<tr><td><kbd>Esc</kbd></td><td>Leave the field or close the editor</td></tr>
<tr><td><kbd>Ctrl + Enter</kbd></td><td>Close the editor</td></tr>
<tr><td><kbd>Ctrl + Space</kbd></td><td>Complete a cell name, unit or function</td></tr>
</table>
<p>Values may be typed in any unit: <code>18 in</code>, <code>450 mm</code>, <code>1'-6"</code>. The cell keeps its display unit.</p>`;
}
