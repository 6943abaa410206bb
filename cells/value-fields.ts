// An input's value typed straight into the sheet (its value field): Enter or leaving the
// field commits what was typed, Escape puts back the stored value and returns to the cell,
// a choice commits when picked. Nothing typed is lost: a commit that is refused shows its
// error at the input and keeps the text (runtime/edit, the input kind's view). A table's
// values are value fields too, each committed to its row and column.

/** Where a value field's text goes: an input cell, or one value of a table (row, column 0-based). */
export interface FieldPlace {
  id: string;
  /** The value stored there now. */
  value: string;
  at?: { row: number; col: number };
}

export interface ValueFieldSheet {
  /** The input cell or table value an element stands for (undefined for anything else). */
  inputOf(target: EventTarget | null): FieldPlace | undefined;
  commitValue(place: FieldPlace, value: string): void;
  /** True while the sheet swaps a field for another: focus leaving it then is no commit. */
  restoring(): boolean;
}

const isValueField = (t: EventTarget | null): t is HTMLInputElement | HTMLSelectElement =>
  (t instanceof HTMLInputElement || t instanceof HTMLSelectElement) && t.classList.contains('value-field');

/** Listens on `host` for the value fields of the input cells drawn in it. */
export function listenToValueFields(host: HTMLElement, sheet: ValueFieldSheet): void {
  const commit = (field: HTMLInputElement | HTMLSelectElement) => {
    const cell = sheet.inputOf(field);
    const value = field.value.trim();
    if (cell && value !== cell.value) sheet.commitValue(cell, value);
  };
  host.addEventListener('keydown', (e) => {
    const field = e.target;
    if (!isValueField(field) || !(field instanceof HTMLInputElement)) return;
    if (e.key === 'Enter') {
      e.preventDefault();
      commit(field);
    } else if (e.key === 'Escape') {
      const cell = sheet.inputOf(field);
      if (cell) field.value = cell.value;
      field.closest<HTMLElement>('article.cell')?.focus();
      e.stopPropagation();
    }
  });
  host.addEventListener('focusout', (e) => {
    if (!sheet.restoring() && isValueField(e.target) && e.target instanceof HTMLInputElement) commit(e.target);
  });
  host.addEventListener('change', (e) => {
    if (isValueField(e.target) && e.target instanceof HTMLSelectElement) commit(e.target);
  });
}
