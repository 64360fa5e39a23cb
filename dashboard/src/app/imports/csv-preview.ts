import Papa from 'papaparse';

export interface CsvPreview {
  headers: string[];
  rows: string[][];
  delimiter: string;
  /** The file began with a UTF-8 byte-order mark (spreadsheet programs write one). */
  hadBom: boolean;
  /** NUL bytes: a spreadsheet, image or other binary file, not CSV text. */
  looksBinary: boolean;
}

/** The first 64 kB are plenty for the header and a few rows; the API reads the whole file. */
export const PREVIEW_BYTES = 64 * 1024;
export const DELIMITER_NAMES: Partial<Record<string, string>> = { ',': 'commas', ';': 'semicolons', '\t': 'tabs' };

/**
 * A first look at a CSV file in the browser, before it is uploaded: the header row and the first
 * `rowCount` rows, with the delimiter guessed among comma, semicolon and tab as the API guesses it.
 * A cut-off last line (the sample ends mid-file) is dropped. O(length of text).
 */
export function previewCsv(text: string, rowCount = 5, truncated = false): CsvPreview {
  const hadBom = text.startsWith('\uFEFF');
  const body = hadBom ? text.slice(1) : text;
  const looksBinary = body.includes('\u0000');
  const parsed = Papa.parse<string[]>(body, {
    preview: rowCount + 2,
    delimitersToGuess: [',', ';', '\t'],
    skipEmptyLines: 'greedy',
  });
  let lines = parsed.data;
  // A sample cut from a larger file may end inside a line: when no line beyond those shown was read, the last is partial.
  if (truncated && lines.length <= rowCount + 1) lines = lines.slice(0, -1);
  const [headers = [], ...rows] = lines;
  return {
    headers: headers.map((h) => h.trim()),
    rows: rows.slice(0, rowCount),
    delimiter: parsed.meta.delimiter,
    hadBom,
    looksBinary,
  };
}

/**
 * Reads the start of a chosen file as UTF-8 text (the API also reads Windows-1252), keeping a
 * byte-order mark so the preview can say it saw one (Blob.text() would drop it).
 */
export async function readFileStart(file: Blob): Promise<{ text: string; truncated: boolean }> {
  const bytes = await file.slice(0, PREVIEW_BYTES).arrayBuffer();
  return { text: new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes), truncated: file.size > PREVIEW_BYTES };
}
