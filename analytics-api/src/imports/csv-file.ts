import { createReadStream } from 'node:fs';
import { open } from 'node:fs/promises';
import { Transform, type Readable } from 'node:stream';
import iconv from 'iconv-lite';
import Papa from 'papaparse';
import { AppError } from '../http/app-error';

export type CsvEncoding = 'utf-8' | 'windows-1252';

export interface CsvShape {
  encoding: CsvEncoding;
  delimiter: string;
  headers: string[];
  sampleRows: string[][];
}

const SAMPLE_BYTES = 64 * 1024;

/**
 * Looks at an uploaded file before anything is read in: refuses empty, binary and header-less
 * files with a message that says what to do, and finds the encoding (UTF-8 with or without
 * BOM, else Windows-1252) and the delimiter (comma, semicolon or tab). Reads the whole file
 * once to prove it is valid UTF-8; O(file size).
 */
export async function sniffCsv(path: string): Promise<CsvShape> {
  const fh = await open(path, 'r');
  let sample: Buffer;
  try {
    const { size } = await fh.stat();
    if (size === 0) throw new AppError('empty-file', 'The file is empty: choose a CSV file with a header row and at least one row of data', 400);
    const buf = Buffer.alloc(Math.min(size, SAMPLE_BYTES));
    await fh.read(buf, 0, buf.length, 0);
    sample = buf;
  } finally {
    await fh.close();
  }
  if (looksBinary(sample)) {
    throw new AppError('binary-file', 'This is not a CSV text file (it looks like a spreadsheet, image or other binary file). Save it as CSV and upload that', 400);
  }
  const encoding: CsvEncoding = (await isValidUtf8(path)) ? 'utf-8' : 'windows-1252';
  const text = decodeSample(sample, encoding);
  const parsed = Papa.parse<string[]>(text, { preview: 8, delimitersToGuess: [',', ';', '\t'], skipEmptyLines: 'greedy' });
  const [headers = [], ...rows] = parsed.data;
  const cleanHeaders = headers.map((h) => h.trim());
  if (cleanHeaders.filter(Boolean).length === 0) {
    throw new AppError('no-header', 'The file has no header row: the first line must name the columns', 400);
  }
  if (cleanHeaders.every((h) => h === '' || /^[\d\s.,/:+-]+$/.test(h))) {
    throw new AppError('no-header', 'The first line holds data, not column names: add a header row naming the columns', 400);
  }
  if (rows.length === 0) throw new AppError('no-rows', 'The file has a header row but no rows of data', 400);
  return { encoding, delimiter: parsed.meta.delimiter, headers: cleanHeaders, sampleRows: rows.slice(0, 5) };
}

/** NUL bytes, or many control characters, do not occur in CSV text. */
function looksBinary(sample: Buffer): boolean {
  let control = 0;
  for (const b of sample) {
    if (b === 0) return true;
    if (b < 9 || (b > 13 && b < 32)) control++;
  }
  return control > sample.length * 0.01;
}

async function isValidUtf8(path: string): Promise<boolean> {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  try {
    for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 })) decoder.decode(chunk as Buffer, { stream: true });
    decoder.decode();
    return true;
  } catch {
    return false;
  }
}

function decodeSample(sample: Buffer, encoding: CsvEncoding): string {
  // The sample may end inside a multi-byte character; drop the incomplete tail.
  const text = encoding === 'utf-8' ? new TextDecoder('utf-8').decode(sample) : iconv.decode(sample, 'win1252');
  return text.replace(/^\uFEFF/, '').replace(/\uFFFD$/, '');
}

/** The file as decoded text (BOM removed). */
function textStream(path: string, encoding: CsvEncoding): Readable {
  // iconv's decode stream is a Readable at run time; its typings say ReadWriteStream.
  const raw = createReadStream(path, { highWaterMark: 1 << 20 });
  if (encoding === 'windows-1252') return raw.pipe(iconv.decodeStream('win1252')) as unknown as Readable;
  const decoder = new TextDecoder('utf-8');
  let first = true;
  return raw.pipe(new Transform({
    transform(chunk: Buffer, _enc, cb) {
      let s = decoder.decode(chunk, { stream: true });
      if (first) { s = s.replace(/^\uFEFF/, ''); first = false; }
      cb(null, s);
    },
    flush(cb) { cb(null, decoder.decode()); },
  }));
}

/**
 * Streams the data rows (after the header) in chunks of arrays of cells, numbered as a
 * spreadsheet shows them (header = 1; lines of nothing but spaces are left out). Quoted fields may hold delimiters and newlines. Papa Parse
 * hands over a chunk of rows at a time and is paused until the consumer has taken them, so
 * memory stays bounded. O(file size) time.
 */
export async function* csvRows(path: string, shape: Pick<CsvShape, 'encoding' | 'delimiter'>): AsyncGenerator<{ firstRow: number; rows: string[][] }> {
  const chunks: string[][][] = [];
  let parser: Papa.Parser | null = null;
  let finished = false;
  let failure: Error | null = null;
  let wake: (() => void) | null = null;
  const signal = () => { const w = wake; wake = null; w?.(); };
  Papa.parse(textStream(path, shape.encoding) as unknown as File, {
    delimiter: shape.delimiter,
    skipEmptyLines: true,
    chunkSize: 1 << 20,
    chunk: (res: Papa.ParseResult<string[]>, p: Papa.Parser) => {
      parser = p;
      p.pause();
      chunks.push(res.data);
      signal();
    },
    complete: () => { finished = true; signal(); },
    error: (e: Error) => { failure = e; signal(); },
  });
  // Rows go out a chunk at a time: one await per row would cost more than the parsing.
  let row = 1;
  let header = true;
  for (;;) {
    const next = chunks.shift();
    if (next) {
      let rows = next;
      if (header) { rows = rows.slice(1); header = false; }
      rows = rows.filter((cells) => cells.length > 1 || cells[0].trim() !== '');
      yield { firstRow: row + 1, rows };
      row += rows.length;
      if (!finished) (parser as Papa.Parser | null)?.resume();
      continue;
    }
    if (failure) throw failure;
    if (finished) return;
    await new Promise<void>((r) => { wake = r; });
  }
}

/** Turns a row of cells into field key → cell text through the user's column mapping. */
export function mapper(headers: string[], mapping: Record<string, string>): (cells: string[]) => Record<string, string> {
  const pairs = Object.entries(mapping)
    .filter(([, header]) => header)
    .map(([field, header]) => [field, headers.indexOf(header)] as const)
    .filter(([, i]) => i >= 0);
  return (cells) => {
    const out: Record<string, string> = {};
    for (const [field, i] of pairs) out[field] = cells[i] ?? '';
    return out;
  };
}
