import { isUtf8 } from 'node:buffer';
import { createReadStream } from 'node:fs';
import { open, stat } from 'node:fs/promises';
import iconv from 'iconv-lite';
import Papa from 'papaparse';
import type { ColumnIndex } from '@shared/imports/validate-row';
import { AppError } from '../http/app-error';
import { CsvSplitter } from './csv-splitter';

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

/** Checks the file in 1 MiB pieces; a character cut at a piece's end is carried to the next. */
async function isValidUtf8(path: string): Promise<boolean> {
  let carry: Buffer | null = null;
  for await (const piece of createReadStream(path, { highWaterMark: 1 << 20 }) as AsyncIterable<Buffer>) {
    const bytes: Buffer = carry ? Buffer.concat([carry, piece]) : piece;
    const whole = bytes.length - incompleteTail(bytes);
    if (!isUtf8(bytes.subarray(0, whole))) return false;
    carry = whole < bytes.length ? Buffer.from(bytes.subarray(whole)) : null;
  }
  return carry === null;
}

/** How many bytes at the end begin a UTF-8 character that the bytes do not finish (0–3). */
function incompleteTail(bytes: Buffer): number {
  for (let back = 1; back <= Math.min(3, bytes.length); back++) {
    const b = bytes[bytes.length - back]!;
    if ((b & 0xc0) === 0x80) continue; // a continuation byte: look further back
    const length = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
    return length > back ? back : 0;
  }
  return 0;
}

function decodeSample(sample: Buffer, encoding: CsvEncoding): string {
  // The sample may end inside a multi-byte character; drop the incomplete tail.
  const text = encoding === 'utf-8' ? new TextDecoder('utf-8').decode(sample) : iconv.decode(sample, 'win1252');
  return text.replace(/^\uFEFF/, '').replace(/\uFFFD$/, '');
}

/** A chunk of data rows and how far into the file they reach. */
export interface CsvChunk {
  /** The spreadsheet row number of rows[0] (the header is row 1). */
  firstRow: number;
  rows: string[][];
  bytesRead: number;
  fileBytes: number;
}

/**
 * Streams the data rows (after the header) in chunks of arrays of cells, numbered as a
 * spreadsheet shows them (header = 1; lines of nothing but spaces are left out). Quoted fields
 * may hold delimiters and line breaks (see CsvSplitter). The file is read 128 KiB at a time
 * (about 1,300 rows; small enough that a chunk's rows are collected young) and the consumer
 * takes a chunk before the next is read, so memory stays bounded whatever the file's size.
 * O(file size) time.
 */
export async function* csvRows(path: string, shape: Pick<CsvShape, 'encoding' | 'delimiter'>): AsyncGenerator<CsvChunk> {
  const { size: fileBytes } = await stat(path);
  const decoder = shape.encoding === 'utf-8' ? new TextDecoder('utf-8') : null;
  const splitter = new CsvSplitter(shape.delimiter);
  let bytesRead = 0;
  let row = 1;
  let header = true;
  const chunk = (records: string[][]): CsvChunk => {
    let rows = records.filter((cells) => cells.length > 1 || cells[0]!.trim() !== '');
    if (header && rows.length) {
      rows = rows.slice(1);
      header = false;
    }
    const out = { firstRow: row + 1, rows, bytesRead, fileBytes };
    row += rows.length;
    return out;
  };
  for await (const piece of createReadStream(path, { highWaterMark: 1 << 17 }) as AsyncIterable<Buffer>) {
    let text = decoder ? decoder.decode(piece, { stream: true }) : iconv.decode(piece, 'win1252');
    if (bytesRead === 0) text = text.replace(/^\uFEFF/, '');
    bytesRead += piece.length;
    yield chunk(splitter.push(text));
  }
  const rest = decoder ? splitter.push(decoder.decode()) : [];
  yield chunk([...rest, ...splitter.end()]);
}

/** Where each mapped field's cells sit in the file's rows: field key → column index. */
export function columnIndex(headers: string[], mapping: Record<string, string>): ColumnIndex {
  const columns: Record<string, number> = {};
  for (const [field, header] of Object.entries(mapping)) {
    const i = header ? headers.indexOf(header) : -1;
    if (i >= 0) columns[field] = i;
  }
  return columns;
}
