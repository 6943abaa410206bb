// Reading a record back: the embedded document text and its digest, checked. Built
// for files that were cut short or edited by hand: it says plainly what is wrong and
// hands back whatever document text it could find.

import { decodeDataBlock } from './escape';
import { DOC_ID, FENCES } from './layout';
import { verifySeal } from './seal';

export interface Unpacked {
  /** The embedded document text (possibly cut short); undefined when none was found. */
  docText?: string;
  /** The digest stored in the file. */
  digest?: string;
  /** SHA-256 of the document text as found. */
  actualDigest?: string;
  /** The seal matches and the file is whole. */
  ok: boolean;
  /** The document text matches its digest. */
  sealOk: boolean;
  /** Plain sentences for the person opening the file. */
  problems: string[];
}

/** Does this text look like an HTML record (rather than a Loadtrace text document)? */
export function looksLikeRecord(text: string): boolean {
  const head = text.slice(0, 4096).trimStart().toLowerCase();
  return head.startsWith('<!doctype html') || head.startsWith('<html') || text.includes(FENCES.head[0]) || /<script\b[^>]*\bid=["']?lt-doc\b/i.test(text);
}

function attr(attrs: string, name: string): string | undefined {
  return new RegExp(`\\b${name}\\s*=\\s*(?:"([^"]*)"|'([^']*)'|([^\\s>]+))`, 'i').exec(attrs)?.slice(1).find((v) => v !== undefined);
}

/** Checks the raw text of the data block (as a page reads it from its own DOM) against its digest. */
export async function checkEmbedded(raw: string, digest: string | undefined, problems: string[] = []): Promise<Unpacked> {
  const docText = decodeDataBlock(raw);
  const seal = await verifySeal(docText, digest);
  if (!seal.ok) problems.push(seal.message);
  return { docText, digest, actualDigest: seal.digest, sealOk: seal.ok, ok: seal.ok && problems.length === 0, problems };
}

export async function unpack(html: string): Promise<Unpacked> {
  const problems: string[] = [];
  const openRe = new RegExp(`<script\\b([^>]*\\bid\\s*=\\s*["']?${DOC_ID}["']?[^>]*)>`, 'gi');
  const opens = [...html.matchAll(openRe)];
  if (opens.length === 0) {
    const cut = /<script\b[^>]*\bid\s*=\s*["']?lt-doc[^>]*$/i.test(html);
    problems.push(cut
      ? 'The file is cut off inside the embedded document; no document text could be read.'
      : 'This file holds no Loadtrace document: it is not a calc record, or its data was removed.');
    return { ok: false, sealOk: false, problems };
  }
  if (opens.length > 1) problems.push(`The file holds ${opens.length} embedded documents; the first one is read. A record written by Loadtrace has one.`);
  const open = opens[0];
  const start = open.index! + open[0].length;
  const end = html.toLowerCase().indexOf('</script', start);
  let raw: string;
  if (end < 0) {
    raw = html.slice(start);
    problems.push('The file is cut off inside the embedded document: what could be read is shown, but part of the document is missing.');
  } else {
    raw = html.slice(start, end);
    if (!/<\/html\s*>\s*$/i.test(html.slice(-4096))) {
      problems.push('The file ends early (it was cut short after the document): the document is whole, but the app code in the file may not run.');
    }
  }
  return checkEmbedded(raw, attr(open[1], 'data-sha256'), problems);
}
