// What the review view needs from the page, and the one adapter that takes it from
// the App. Kept apart so the review modules never reach into the App's insides:
// if the shell changes, this file is the only one to follow it.

import type { CalcDocument } from '../../runtime/document';
import type { Engine } from '../../runtime/engine-types';
import type { App } from '../app';

export interface ReviewHost {
  doc(): CalcDocument;
  engine(): Engine | undefined;
  /** Records a new version of the sheet in the undo history and runs it. */
  apply(doc: CalcDocument): void;
  /** The <article> of a cell, when it is on the page. */
  cellElement(id: string): HTMLElement | undefined;
  select(id: string): void;
  status(text: string): void;
  /** Calls `listener` (at most once a frame) after the sheet or its results changed. */
  onChange(listener: () => void): void;
}

type Wrapped = 'open' | 'apply' | 'undo' | 'redo';

/**
 * The App as a review host. The App has no change event, so the four methods every
 * change of sheet goes through (open, apply, undo, redo) are wrapped on this one
 * instance, and each new engine is followed for its results.
 */
const hosts = new WeakMap<App, ReviewHost>();

/** The one host of an App (the review and the record line both follow it; its methods are wrapped once). */
export function appHost(app: App): ReviewHost {
  let host = hosts.get(app);
  if (!host) hosts.set(app, (host = makeHost(app)));
  return host;
}

function makeHost(app: App): ReviewHost {
  const listeners: (() => void)[] = [];
  let queued = false;
  const notify = (): void => {
    if (queued) return;
    queued = true;
    requestAnimationFrame(() => {
      queued = false;
      for (const l of listeners) l();
    });
  };
  let followed: Engine | undefined;
  let unsubscribe: (() => void) | undefined;
  const follow = (): void => {
    if (app.engine === followed) return;
    unsubscribe?.();
    followed = app.engine;
    unsubscribe = followed?.subscribe(() => notify());
  };
  for (const name of ['open', 'apply', 'undo', 'redo'] as Wrapped[]) {
    const original = (app[name] as (...args: unknown[]) => void).bind(app);
    (app as unknown as Record<Wrapped, (...args: unknown[]) => void>)[name] = (...args: unknown[]) => {
      original(...args);
      follow();
      notify();
    };
  }
  follow();
  return {
    doc: () => app.doc,
    engine: () => app.engine,
    apply: (doc) => app.apply(doc),
    cellElement: (id) => app.view.element(id),
    select: (id) => {
      app.view.select(id);
      app.view.element(id)?.scrollIntoView({ block: 'center' });
    },
    status: (text) => app.setStatus(text),
    onChange: (l) => {
      listeners.push(l);
    },
  };
}
