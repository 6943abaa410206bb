// CodeMirror is needed only once a source is opened for editing, so it is loaded then
// (and ahead of time when the page is idle), not while a sheet or record opens. In a
// calc record this module is swapped for cells/record/editor-load.ts, which unpacks the
// editor code the record carries (see cells/record/vite.config.ts).

import type { SourceEditor } from './source-editor';

export type SourceEditorClass = typeof SourceEditor;

let loading: Promise<SourceEditorClass> | undefined;

export function loadSourceEditor(): Promise<SourceEditorClass> {
  loading ??= import('./source-editor').then(
    (m) => m.SourceEditor,
    (e: unknown) => {
      loading = undefined; // a later attempt may succeed
      throw e;
    },
  );
  return loading;
}
