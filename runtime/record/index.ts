// The calc record: one self-contained HTML file (app, document, seal, static rendering).

export { staticHtml, numberCells, CAUTION, type StaticOptions } from './static-html';
export { STATIC_CSS, pageCss } from './static-css';
export { sha256Hex, sha256Base64, verifySeal, type SealCheck } from './seal';
export { pack, recordTitle, PackError, type PackInput } from './pack';
export { unpack, checkEmbedded, looksLikeRecord, type Unpacked } from './unpack';
export { exportRecord, type ExportedRecord, type ExportOptions } from './export';
export { verifyHtml, pageParts, type HtmlParse, type ParsedHtml } from './parsed';
export { verifyParts, type RecordCheck, type PartCheck, type SealManifest } from './verify';
export { PARTS, partLabel, type PartName, type PageParts } from './seal-parts';
export { recordLinesHtml, RECORD_LINES_CSS, SEAL_MEANING, type RecordLines, type SealKnown } from './record-lines';
export type { TreeReader } from './canon';
export { readDocumentSource, type DocumentSource } from './source';
export { shellOf, recordCsp, DOC_ID, DOC_TYPE, STATIC_ID, FENCES } from './layout';
export { encodeDataBlock, decodeDataBlock, escapeHtml } from './escape';
