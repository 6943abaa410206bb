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

/** The closest candidate within a distance that still looks like a typo, or undefined. */
export function nearestName(name: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined;
  let bestD = Infinity;
  for (const c of candidates) {
    const d = editDistance(name, c);
    if (d < bestD || (d === bestD && best !== undefined && c < best)) {
      best = c;
      bestD = d;
    }
  }
  const limit = Math.max(1, Math.ceil(name.length / 3));
  return bestD <= limit ? best : undefined;
}
