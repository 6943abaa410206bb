// Reading back a PDF that Chromium printed: how many pages, and on which page each named
// destination lies (Chromium writes one for every element a link points at, e.g. the
// contents' links to each calc). Chromium's PDF keeps its dictionaries uncompressed (only
// streams are), so the page tree and the destinations read as text.

/** Non-stream objects by number: their dictionary text. */
function objects(pdf: string): Map<number, string> {
  const out = new Map<number, string>();
  for (const m of pdf.matchAll(/(?:^|\s)(\d+) 0 obj\s*([\s\S]*?)\s*(?:stream|endobj)/g)) out.set(Number(m[1]), m[2]);
  return out;
}

const ref = (dict: string, key: string): number | undefined => {
  const m = new RegExp(`/${key}\\s+(\\d+)\\s+0\\s+R`).exec(dict);
  return m ? Number(m[1]) : undefined;
};

export interface PdfPages {
  /** Pages in order, by object number. */
  pages: number[];
  /** 1-based page of each named destination. */
  dests: Map<string, number>;
}

export function pdfPages(bytes: Buffer | string): PdfPages {
  const pdf = typeof bytes === 'string' ? bytes : bytes.toString('latin1');
  const objs = objects(pdf);
  const catalog = [...objs.values()].find((d) => /\/Type\s*\/Catalog\b/.test(d));
  if (!catalog) throw new Error('the PDF has no catalog that can be read');
  const pages: number[] = [];
  const walk = (n: number, depth: number) => {
    const d = objs.get(n);
    if (d === undefined || depth > 64) return;
    if (/\/Type\s*\/Pages\b/.test(d)) {
      for (const k of (/\/Kids\s*\[([^\]]*)\]/.exec(d)?.[1] ?? '').matchAll(/(\d+)\s+0\s+R/g)) walk(Number(k[1]), depth + 1);
    } else pages.push(n);
  };
  const root = ref(catalog, 'Pages');
  if (root !== undefined) walk(root, 0);
  const index = new Map(pages.map((p, i) => [p, i + 1]));
  const dests = new Map<string, number>();
  const destsAt = ref(catalog, 'Dests');
  const destText = destsAt !== undefined ? objs.get(destsAt) ?? '' : '';
  for (const m of destText.matchAll(/\/([^\s/[\]<>()]+)\s*\[\s*(\d+)\s+0\s+R/g)) {
    const page = index.get(Number(m[2]));
    if (page !== undefined) dests.set(m[1].replace(/#([0-9A-Fa-f]{2})/g, (_a, h: string) => String.fromCharCode(parseInt(h, 16))), page);
  }
  return { pages, dests };
}

/** Pages in a PDF Chromium printed. */
export function pdfPageCount(bytes: Buffer | string): number {
  return pdfPages(bytes).pages.length;
}
