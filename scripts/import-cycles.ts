// Lists the import cycles among the project's own TypeScript files, type-only imports
// included: `npx tsx scripts/import-cycles.ts` (exit 1 when there is one). The test
// tests/house/layout.test.ts runs the same check.

import { importCycles } from '../tests/house/imports';

const cycles = importCycles(process.cwd());
for (const c of cycles) console.log(`files that import each other in a cycle: ${c.join(', ')}`);
console.log(cycles.length === 0 ? 'no import cycle' : `${cycles.length} import cycle(s)`);
process.exit(cycles.length === 0 ? 0 : 1);
