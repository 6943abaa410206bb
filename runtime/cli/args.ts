// Command-line arguments of `npm run calc -- FILE [--set NAME=VALUE]... [--json]`.

export interface CalcArgs {
  file: string;
  sets: { name: string; value: string }[];
  json: boolean;
  exportTo?: string;
  diffWith?: string;
}

export class UsageError extends Error {}

export const USAGE = `usage: npm run calc -- FILE [--set NAME=VALUE]... [--json] [--diff OTHER] [--export OUT.html]
  FILE              a template or record (.lt text, or an exported .html record)
  --set NAME=VALUE  override an input, e.g. --set fc="5000 psi"
  --json            print the results as JSON instead of a table
  --diff OTHER      compare with a second record (e.g. another revision): the inputs,
                    results and checks that differ, side by side; exit 0 (2 if unreadable)
  --export OUT.html write the calc record: one self-contained, sealed HTML file
                    (builds the app shell first if dist-record/ is missing or stale)
exit code: 0 every check passes, 1 a check fails, 2 the document or an override is broken`;

export function parseArgs(argv: string[]): CalcArgs {
  const out: CalcArgs = { file: '', sets: [], json: false };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--json') out.json = true;
    else if (a === '--set' || a.startsWith('--set=')) {
      const spec = a === '--set' ? argv[++i] : a.slice(6);
      if (spec === undefined) throw new UsageError('--set needs NAME=VALUE');
      const eq = spec.indexOf('=');
      if (eq <= 0) throw new UsageError(`--set ${spec}: write it as NAME=VALUE, e.g. --set fc="5000 psi"`);
      out.sets.push({ name: spec.slice(0, eq).trim(), value: spec.slice(eq + 1).trim() });
    } else if (a === '--export') {
      out.exportTo = argv[++i];
      if (!out.exportTo) throw new UsageError('--export needs an output file');
    } else if (a === '--diff') {
      out.diffWith = argv[++i];
      if (!out.diffWith) throw new UsageError('--diff needs a second record');
    } else if (a === '--help' || a === '-h') throw new UsageError(USAGE);
    else if (a.startsWith('-')) throw new UsageError(`unknown option ${a}\n${USAGE}`);
    else if (!out.file) out.file = a;
    else throw new UsageError(`only one FILE may be given (got ${out.file} and ${a})`);
  }
  if (!out.file) throw new UsageError(USAGE);
  return out;
}
