// `note <id>` followed by text lines `  | ...`, one per line of the note.

import type { NoteCell } from '../../document';
import { bareHeader, commonAttrs } from '../fields';
import type { KindFormat } from '../types';

export const noteFormat: KindFormat<NoteCell> = {
  kind: 'note',
  header: bareHeader<NoteCell>('note', (id) => ({ kind: 'note', id, text: '' })),
  attrs: commonAttrs<NoteCell>(),
  body: {
    // '' has no lines at all; otherwise every line, empty ones included.
    write: (cell) => (cell.text === '' ? [] : cell.text.split('\n')),
    read: (cell, lines) => {
      cell.text = lines.join('\n');
    },
  },
};
