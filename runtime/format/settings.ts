// Sheet settings written as header lines after the title block (FORMAT.md "Settings"):
// `working  open` says how the printed record and its static page show the working of the
// library calls. Left out, the default: open for the governing checks, folded elsewhere.

export const WORKING_KEYWORD = 'working';
export const WORKING_CHOICES = ['governing', 'open', 'folded'] as const;
export type WorkingSetting = (typeof WORKING_CHOICES)[number];

/** The setting a line's value names, or undefined when it names none. */
export function workingSetting(value: string): WorkingSetting | undefined {
  return (WORKING_CHOICES as readonly string[]).includes(value) ? (value as WorkingSetting) : undefined;
}
