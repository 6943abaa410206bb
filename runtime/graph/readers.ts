// name → ids of the cells whose source mentions it, kept up to date as cells change,
// so an edit finds the cells it touches without walking the whole document.

export class ReadersIndex {
  private readonly byName = new Map<string, Set<string>>();

  add(id: string, refs: readonly string[]): void {
    for (const r of refs) {
      let set = this.byName.get(r);
      if (!set) this.byName.set(r, (set = new Set()));
      set.add(id);
    }
  }

  remove(id: string, refs: readonly string[]): void {
    for (const r of refs) this.byName.get(r)?.delete(id);
  }

  of(name: string): Iterable<string> {
    return this.byName.get(name) ?? [];
  }
}
