// Loops among cells. The reactive runtime only says "circular definition";
// the engine finds the loops itself so it can name every member.

/**
 * Strongly connected components of size > 1, plus self-loops (Tarjan, iterative
 * so a long chain cannot overflow the stack). `edges(v)` lists what v reads.
 */
export function findCycles<T>(nodes: Iterable<T>, edges: (v: T) => Iterable<T>): T[][] {
  const index = new Map<T, number>();
  const low = new Map<T, number>();
  const onStack = new Set<T>();
  const stack: T[] = [];
  const out: T[][] = [];
  let next = 0;

  for (const root of nodes) {
    if (index.has(root)) continue;
    const work: { v: T; it: Iterator<T> }[] = [];
    const open = (v: T) => {
      index.set(v, next);
      low.set(v, next);
      next++;
      stack.push(v);
      onStack.add(v);
      work.push({ v, it: edges(v)[Symbol.iterator]() });
    };
    open(root);
    while (work.length) {
      const top = work[work.length - 1];
      const step = top.it.next();
      if (!step.done) {
        const w = step.value;
        if (!index.has(w)) open(w);
        else if (onStack.has(w)) low.set(top.v, Math.min(low.get(top.v)!, index.get(w)!));
        continue;
      }
      work.pop();
      if (work.length) {
        const parent = work[work.length - 1].v;
        low.set(parent, Math.min(low.get(parent)!, low.get(top.v)!));
      }
      if (low.get(top.v) === index.get(top.v)) {
        const comp: T[] = [];
        let w: T;
        do {
          w = stack.pop()!;
          onStack.delete(w);
          comp.push(w);
        } while (w !== top.v);
        const selfLoop = comp.length === 1 && [...edges(top.v)].includes(top.v);
        if (comp.length > 1 || selfLoop) out.push(comp.reverse());
      }
    }
  }
  return out;
}

/**
 * Every cell in a loop, with a sentence naming the loop ("a reads c, c reads b, b reads a"
 * or "a uses itself"). `edges(id)` lists the ids a cell reads.
 */
export function loopMessages(ids: string[], edges: (id: string) => string[], nameOf: (id: string) => string): Map<string, string> {
  const out = new Map<string, string>();
  for (const loop of findCycles(ids, edges)) {
    const text = loop.length === 1 ? `${nameOf(loop[0])} uses itself` : describeLoop(loop, edges, nameOf);
    for (const id of loop) out.set(id, text);
  }
  return out;
}

/** How many steps of a loop a message spells out; a longer loop is counted, not listed. */
const LOOP_STEPS = 8;

/** "a reads c, c reads b, b reads a": the loop walked along what each cell reads. */
function describeLoop(loop: string[], edges: (id: string) => string[], nameOf: (id: string) => string): string {
  const members = new Set(loop);
  const steps: string[] = [];
  const visited = new Set<string>();
  let at = loop[0];
  while (!visited.has(at) && steps.length < LOOP_STEPS) {
    visited.add(at);
    const next = edges(at).find((e) => members.has(e) && (!visited.has(e) || e === loop[0]));
    if (!next) break;
    steps.push(`${nameOf(at)} reads ${nameOf(next)}`);
    at = next;
  }
  if (loop.length > LOOP_STEPS) return `${steps.join(', ')}, … (a loop of ${loop.length} cells)`;
  const missed = loop.filter((id) => !visited.has(id)).map(nameOf);
  return steps.join(', ') + (missed.length ? `; also in the loop: ${missed.join(', ')}` : '');
}
