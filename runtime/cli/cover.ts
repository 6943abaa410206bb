// `--cover KEY=VALUE`: what a package's cover says beyond the title block: its title and
// the engineer of record's block.

import type { EngineerOfRecord } from '../package/front';

export type CoverField = 'title' | keyof EngineerOfRecord;

export interface CoverSetting {
  key: string;
  field: CoverField;
  value: string;
}

const COVER_KEYS: ReadonlyMap<string, CoverField> = new Map<string, CoverField>([
  ['title', 'title'], ['engineer', 'name'], ['license', 'license'], ['licence', 'license'], ['firm', 'firm'],
]);

export const COVER_KEYS_TEXT = 'title, engineer, license (or licence), firm';

/** Reads `KEY=VALUE`; `fail` makes the error thrown for a bad one. */
export function parseCoverSpec(spec: string, fail: (message: string) => Error): CoverSetting {
  const eq = spec.indexOf('=');
  if (eq <= 0) throw fail(`--cover ${spec}: write it as KEY=VALUE, e.g. --cover engineer="A. Nwosu, PE"; the keys are ${COVER_KEYS_TEXT}`);
  const key = spec.slice(0, eq).trim();
  const field = COVER_KEYS.get(key.toLowerCase());
  if (!field) throw fail(`--cover ${key}: no such cover key; the keys are ${COVER_KEYS_TEXT}`);
  const value = spec.slice(eq + 1).trim();
  if (/[\r\n]/.test(value)) throw fail(`--cover ${key}: a cover field is one line`);
  return { key, field, value };
}
