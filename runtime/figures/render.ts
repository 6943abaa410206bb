// One entry point: a figure spec (or a sweep result) to an SVG string.

import { renderFootingDrawing } from './footing';
import { renderInteraction } from './interaction';
import { renderLoadPath } from './load-path';
import { renderPlateMap } from './plate';
import { renderPunching } from './punching';
import type { FigureSpec, SweepResult } from './spec';
import { renderSweepChart } from './sweep-chart';

export function renderFigure(spec: FigureSpec): string {
  switch (spec.figure) {
    case 'punching': return renderPunching(spec);
    case 'footing': return renderFootingDrawing(spec);
    case 'plate': return renderPlateMap(spec);
    case 'load-path': return renderLoadPath(spec);
    case 'interaction': return renderInteraction(spec);
  }
}

export function renderSweep(result: SweepResult, title = ''): string {
  return renderSweepChart(result, title);
}

export type { FigureSpec, SweepResult } from './spec';
