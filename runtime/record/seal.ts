// The record's seal: a SHA-256 digest (WebCrypto, in Node 20 and every browser) of
// the embedded document text, UTF-8 encoded. It shows that the document was not
// edited outside Loadtrace after export; it is not a signature (anyone can reseal).

/** Lower-case hex SHA-256 of the text's UTF-8 bytes. */
export async function sha256Hex(text: string): Promise<string> {
  const bytes = new TextEncoder().encode(text);
  const hash = new Uint8Array(await globalThis.crypto.subtle.digest('SHA-256', bytes));
  return Array.from(hash, (b) => b.toString(16).padStart(2, '0')).join('');
}

/** Base64 SHA-256, the form a Content-Security-Policy hash source takes. */
export async function sha256Base64(text: string): Promise<string> {
  const hash = new Uint8Array(await globalThis.crypto.subtle.digest('SHA-256', new TextEncoder().encode(text)));
  let bin = '';
  for (const b of hash) bin += String.fromCharCode(b);
  return btoa(bin);
}

export type SealCheck =
  | { ok: true; digest: string }
  | { ok: false; digest: string; expected?: string; message: string };

/** Checks the embedded text against the digest stored beside it. */
export async function verifySeal(docText: string, stored: string | undefined): Promise<SealCheck> {
  const digest = await sha256Hex(docText);
  if (!stored) return { ok: false, digest, message: 'The record carries no digest, so it cannot be shown to be as exported.' };
  if (!/^[0-9a-f]{64}$/.test(stored)) {
    return { ok: false, digest, expected: stored, message: 'The record\'s digest is not a SHA-256 value; the file was edited outside Loadtrace.' };
  }
  if (stored !== digest) {
    return { ok: false, digest, expected: stored, message: 'This record was edited outside Loadtrace: its document no longer matches the digest written when it was exported.' };
  }
  return { ok: true, digest };
}
