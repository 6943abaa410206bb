// CodeMirror 6 editor for formula, check and note sources: highlights cell names,
// units and functions; completes names (with their current values), units and
// library functions (with signature and clause); marks engine errors at their column.

import { autocompletion, completionStatus, type Completion, type CompletionContext, type CompletionResult } from '@codemirror/autocomplete';
import { EditorState, Prec, RangeSetBuilder, StateEffect, StateField, type Extension } from '@codemirror/state';
import { Decoration, EditorView, ViewPlugin, keymap, type DecorationSet, type ViewUpdate } from '@codemirror/view';
import { minimalSetup } from 'codemirror';
import { completionPlace, NAME_BEFORE, NAME_SO_FAR, sourceMarks, type SourceMode } from './source-marks';
import type { Vocabulary } from './vocabulary';

export type { SourceMode };

export interface SourceEditorOptions {
  parent: HTMLElement;
  text: string;
  mode: SourceMode;
  /** Read afresh on each keystroke, so values shown in completion are current. */
  vocabulary: () => Vocabulary;
  label: string;
  onChange(text: string): void;
  onDone(): void;
  onCancel(): void;
}

export interface SourceMark {
  /** 0-based offsets in the editor text. */
  from: number;
  to: number;
  message: string;
}

const setMarks = StateEffect.define<SourceMark[]>();

const marksField = StateField.define<DecorationSet>({
  create: () => Decoration.none,
  update(deco, tr) {
    deco = deco.map(tr.changes);
    for (const e of tr.effects) {
      if (!e.is(setMarks)) continue;
      const len = tr.state.doc.length;
      const ranges = e.value
        .map((m) => {
          const from = Math.max(0, Math.min(m.from, len));
          const to = Math.max(from, Math.min(Math.max(m.to, from + 1), len));
          // An error at the very end (something missing) marks the last character.
          const [a, b] = from === to && len > 0 ? [Math.max(0, len - 1), len] : [from, to];
          return a === b ? null : Decoration.mark({ class: 'cm-lt-error', attributes: { title: m.message } }).range(a, b);
        })
        .filter((r): r is NonNullable<typeof r> => r !== null);
      deco = Decoration.set(ranges, true);
    }
    return deco;
  },
  provide: (f) => EditorView.decorations.from(f),
});

/** Highlighting by the engine's tokenizer: sources are one or a few lines. */
function highlighter(mode: SourceMode, vocabulary: () => Vocabulary) {
  const build = (view: EditorView): DecorationSet => {
    const voc = vocabulary();
    const words = { names: new Set(voc.names.map((n) => n.name)), functions: new Set(voc.functions.map((f) => f.name)), units: new Set(voc.units) };
    const builder = new RangeSetBuilder<Decoration>();
    for (const m of sourceMarks(view.state.doc.toString(), mode, words)) builder.add(m.from, m.to, Decoration.mark({ class: m.cls }));
    return builder.finish();
  };
  return ViewPlugin.fromClass(
    class {
      decorations: DecorationSet;
      constructor(view: EditorView) {
        this.decorations = build(view);
      }
      update(u: ViewUpdate) {
        if (u.docChanged || u.focusChanged) this.decorations = build(u.view);
      }
    },
    { decorations: (v) => v.decorations },
  );
}

function completer(mode: SourceMode, vocabulary: () => Vocabulary) {
  return (context: CompletionContext): CompletionResult | null => {
    const word = context.matchBefore(NAME_BEFORE);
    if (!word || (word.from === word.to && !context.explicit)) return null;
    const { complete, afterNumber } = completionPlace(context.state.doc.sliceString(0, word.from), mode);
    if (!complete) return null;
    const voc = vocabulary();
    const options: Completion[] = [];
    for (const n of voc.names) {
      options.push({
        label: n.name, type: 'variable', boost: afterNumber ? -5 : 10,
        detail: n.value !== undefined ? `= ${n.value}` : '(no value yet)', info: n.label,
      });
    }
    for (const f of voc.functions) {
      options.push({
        label: f.name, type: 'function', boost: afterNumber ? -10 : 0, detail: f.signature,
        info: f.clause ? `${f.doc}\n${f.clause}` : f.doc, apply: `${f.name}(`,
      });
    }
    for (const u of voc.units) options.push({ label: u, type: 'unit', detail: 'unit', boost: afterNumber ? 20 : -20 });
    return { from: word.from, options, validFor: NAME_SO_FAR };
  };
}

export class SourceEditor {
  readonly view: EditorView;
  private silent = false;

  constructor(opts: SourceEditorOptions) {
    const extensions: Extension[] = [
      minimalSetup,
      // Above minimalSetup's keys, so Enter in a formula finishes rather than breaks the line.
      Prec.high(keymap.of([
        { key: 'Mod-Enter', run: () => (opts.onDone(), true) },
        // A formula is one line: Enter finishes it. While completions are showing, Enter
        // belongs to them; while a query is only pending (none shown yet: fast typing or a
        // busy machine), the reader sees no list, so Enter still finishes.
        ...(opts.mode === 'formula'
          ? [{ key: 'Enter', run: (v: EditorView) => (completionStatus(v.state) !== 'active' && opts.onDone(), true) }]
          : []),
        { key: 'Escape', run: () => (opts.onCancel(), true) },
      ])),
      autocompletion({ override: [completer(opts.mode, opts.vocabulary)], icons: false, activateOnTyping: true, interactionDelay: 0 }),
      highlighter(opts.mode, opts.vocabulary),
      marksField,
      EditorView.lineWrapping,
      EditorView.contentAttributes.of({ 'aria-label': opts.label, spellcheck: opts.mode === 'note' ? 'true' : 'false' }),
      EditorView.updateListener.of((u) => {
        if (u.docChanged && !this.silent) opts.onChange(u.state.doc.toString());
      }),
    ];
    this.view = new EditorView({ state: EditorState.create({ doc: opts.text, extensions }), parent: opts.parent });
  }

  get text(): string {
    return this.view.state.doc.toString();
  }

  /** Replaces the error marks (engine errors or source problems). */
  setMarks(marks: SourceMark[]): void {
    this.view.dispatch({ effects: setMarks.of(marks) });
  }

  /** Replaces the text without reporting it as a change (e.g. after undo). */
  setText(text: string): void {
    if (text === this.text) return;
    this.silent = true;
    try {
      this.view.dispatch({ changes: { from: 0, to: this.view.state.doc.length, insert: text } });
    } finally {
      this.silent = false;
    }
  }

  focus(): void {
    this.view.focus();
    this.view.dispatch({ selection: { anchor: this.view.state.doc.length } });
  }

  /** Puts the selection at anchor…head, clamped to the text (e.g. where a plain field had it). */
  select(anchor: number, head = anchor): void {
    const len = this.view.state.doc.length;
    this.view.dispatch({ selection: { anchor: Math.min(anchor, len), head: Math.min(head, len) } });
  }

  destroy(): void {
    this.view.destroy();
  }
}
