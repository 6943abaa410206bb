// Whether the page is in review mode (the checker's side). Read by the record export:
// a sheet changed in review is written as a working copy from review, not as a draft.

let on = false;
const listeners: (() => void)[] = [];

export const reviewMode = {
  get on(): boolean {
    return on;
  },
  set(value: boolean): void {
    if (on === value) return;
    on = value;
    for (const l of listeners) l();
  },
  onChange(listener: () => void): void {
    listeners.push(listener);
  },
};
