// The order in which the engine compiles changed cells: each after the changed cells it
// reads. A depth-first walk on an explicit stack, so a chain of any length fits (a
// recursive walk overflowed the stack at about 3,000 chained cells written in reverse).

/**
 * Calls `visit` once for every id in `queue` (which may grow while this runs), each after
 * the ids `upstream(id)` yields; `done` holds the ids visited so far. Ids in a loop are
 * visited in some order (the engine gives them an error of their own).
 */
export function upstreamFirst(
  queue: string[],
  upstream: (id: string) => Iterable<string>,
  visit: (id: string) => void,
  done: Set<string> = new Set(),
): void {
  const visiting = new Set<string>();
  for (let i = 0; i < queue.length; i++) {
    const root = queue[i];
    if (done.has(root)) continue;
    const work = [{ id: root, ups: upstream(root)[Symbol.iterator]() }];
    visiting.add(root);
    while (work.length) {
      const top = work[work.length - 1];
      const step = top.ups.next();
      if (!step.done) {
        const up = step.value;
        if (!done.has(up) && !visiting.has(up)) {
          visiting.add(up);
          work.push({ id: up, ups: upstream(up)[Symbol.iterator]() });
        }
        continue;
      }
      work.pop();
      visiting.delete(top.id);
      done.add(top.id);
      visit(top.id);
    }
  }
}
