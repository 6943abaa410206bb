// `npm run calc -- FILE --verify`: every part of a record file checked against its
// seal (read with parse5, as a browser parses it), the state the record was written
// in, and what the seal does and does not prove. Exit 0 when every part is as
// written; 2 naming the first part that differs (or why nothing can be checked).

import { readFileSync } from 'node:fs';
import { stateTitle } from '../present/record-state';
import { looksLikeRecord, SEAL_MEANING } from '../record/index';
import { verifyRecordFile } from '../record/node';

export async function verifyReport(file: string, out: (s: string) => void, err: (s: string) => void): Promise<number> {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    err(`cannot read ${file}: ${(e as Error).message}`);
    return 2;
  }
  if (!looksLikeRecord(text)) {
    err(`${file}: not a calc record (an .html file written by Loadtrace); nothing to verify`);
    return 2;
  }
  const check = await verifyRecordFile(text);
  if (check.recordDigest) out(`${file}: record SHA-256 ${check.recordDigest}`);
  if (check.manifest) {
    out(`written ${check.manifest.written} as: ${stateTitle(check.manifest.state)}`);
  }
  for (const p of check.parts) out(`  ${p.ok ? 'ok     ' : 'DIFFERS'}  ${p.label}`);
  if (check.verified) {
    out(`verified: every part of the file is as Loadtrace wrote it. ${SEAL_MEANING}`);
    return 0;
  }
  for (const p of check.problems) out(`  ! ${p}`);
  err(`${file}: NOT VERIFIED: ${check.problems[0]}`);
  return 2;
}
