// The record build's loadSourceEditor (it replaces cells/source-editor-load.ts): the
// editor code travels in the record as its own packed block, unpacked and run as an
// inline script the record's CSP lists by hash, the first time a source is edited.

import { EDITOR_GLOBAL, EDITOR_ID, EDITOR_RUN_ID, PART_OF, unpackApp } from '../../runtime/record/app-payload';
import type { SourceEditorClass } from '../source-editor-load';
import { runBlock } from './run-block';

let loading: Promise<SourceEditorClass> | undefined;

async function unpackAndRun(): Promise<SourceEditorClass> {
  const found = (globalThis as Record<string, unknown>)[EDITOR_GLOBAL] as { SourceEditor?: SourceEditorClass } | undefined;
  if (found?.SourceEditor) return found.SourceEditor;
  const block = document.getElementById(EDITOR_ID);
  if (!block) throw new Error('this record carries no editor code');
  const parts = [block, ...document.querySelectorAll(`script[${PART_OF}="${EDITOR_ID}"]`)];
  const code = await unpackApp(parts.map((el) => el.textContent?.trim() ?? '').join(''));
  const loaded = runBlock(EDITOR_RUN_ID, code, EDITOR_GLOBAL) as { SourceEditor?: SourceEditorClass } | undefined;
  if (!loaded?.SourceEditor) throw new Error('the editor code in this record did not start');
  return loaded.SourceEditor;
}

export function loadSourceEditor(): Promise<SourceEditorClass> {
  loading ??= unpackAndRun().catch((e: unknown) => {
    loading = undefined;
    throw e;
  });
  return loading;
}
