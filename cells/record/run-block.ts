// Runs a record's unpacked code block as an inline script (the record's CSP lists its
// hash) and returns the global it sets. The script element carries `id`, so a re-export
// leaves it out (runtime/record/app-payload.ts withoutRunScript); it is added only once.

export function runBlock(id: string, code: string, global: string): unknown {
  if (!document.getElementById(id)) {
    const el = document.createElement('script');
    el.id = id;
    el.textContent = code;
    document.body.append(el);
  }
  return (globalThis as Record<string, unknown>)[global];
}
