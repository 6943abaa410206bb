// "Did you mean ...?" for unknown names: the nearest cell name by edit distance.

export function editDistance(a: string, b: string): number {
  const m = a.length, n = b.length;
  let prev = Array.from({ length: n + 1 }, (_, j) => j);
  for (let i = 1; i <= m; i++) {
    const cur = [i];
    for (let j = 1; j <= n; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : a[i - 1].toLowerCase() === b[j - 1].toLowerCase() ? 0.5 : 1;
      cur[j] = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + cost);
    }
    prev = cur;
  }
  return prev[n];
}

/**
 * The closest candidate within a distance that still looks like a typo, or undefined.
 * A candidate equal but for case always wins (d for D), ahead of a nearer-looking other.
 */
export function nearestName(name: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined;
  let bestD = Infinity;
  const folded = name.toLowerCase();
  for (const c of candidates) {
    if (c.toLowerCase() === folded && c !== name) return c;
    const d = editDistance(name, c);
    if (d < bestD || (d === bestD && best !== undefined && c < best)) {
      best = c;
      bestD = d;
    }
  }
  // A one- or two-letter name is too short to guess a typo in: a letter more or less is
  // suggested only after the same first letter (Pq → Pu, but not if → Df, nor x → N).
  const short = name.length <= 2 && best !== undefined && best[0] !== name[0];
  const limit = short ? 0.5 : Math.max(1, Math.ceil(name.length / 3));
  return bestD <= limit ? best : undefined;
}
