import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import type { PedigreeTreeNode } from '@shared/contracts/animals';
import { formatWeight, type UnitSetting } from '@shared/units/weight';

const require = createRequire(import.meta.url);
// The product's own typeface (OFL), as shipped for the dashboard; fontkit reads WOFF.
const FONT_REGULAR = require.resolve('@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff');
const FONT_BOLD = require.resolve('@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-600-normal.woff');

export const CERTIFICATE_GENERATIONS = 4;
export const CERTIFICATE_FOOTER =
  'This certificate is the breeder\'s own record, printed from Keeperline. It is not a registration: only the registrar registers an animal.';

export interface CertificateData {
  tree: PedigreeTreeNode;
  breed: string | null;
  birthDate: string | null;
  rabbitry: string;
  printedOn: string;
  unit: UnitSetting;
  paper: 'letter' | 'a4';
}

const INK = '#1d2430';
const MUTED = '#6b7280';
const RULE = '#9aa3af';

/** Text cut to fit `width` at the current font and size, with an ellipsis when cut. */
function fit(doc: PDFKit.PDFDocument, text: string, width: number): string {
  if (doc.widthOfString(text) <= width) return text;
  let s = text;
  while (s.length > 1 && doc.widthOfString(`${s}…`) > width) s = s.slice(0, -1);
  return `${s}…`;
}

function weightText(n: PedigreeTreeNode, unit: UnitSetting): string | null {
  return n.weightGrams ? formatWeight(n.weightGrams, unit) : null;
}

/**
 * The pedigree certificate: the animal, then four generations of ancestors in columns (parents,
 * grandparents, great- and great-great-grandparents, 30 places), each with ear ID, name, variety,
 * weight in the reader's unit, registration number and a GC mark for grand champions; breeder,
 * rabbitry, date printed, and a footer saying it is the breeder's record, not a registration.
 * Cost O(2^generations). Throws what pdfkit throws on an unreadable font.
 */
export function renderPedigreePdf(data: CertificateData): Promise<Buffer> {
  const doc = new PDFDocument({
    size: data.paper === 'a4' ? 'A4' : 'LETTER', margins: { top: 36, left: 36, right: 36, bottom: 18 },
    info: { Title: `Pedigree of ${data.tree.earId}`, Author: data.rabbitry, Creator: 'Keeperline' },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.registerFont('plex', FONT_REGULAR);
  doc.registerFont('plex-bold', FONT_BOLD);

  const { width: pageW, height: pageH } = doc.page;
  const left = 36;
  const contentW = pageW - 72;
  const a = data.tree;

  // Header: the animal itself.
  doc.fillColor(INK).font('plex-bold').fontSize(18).text('Pedigree certificate', left, 36);
  doc.font('plex').fontSize(9).fillColor(MUTED).text(`Rabbitry: ${data.rabbitry}    Printed ${data.printedOn}`, left, 40, { width: contentW, align: 'right' });
  doc.font('plex-bold').fontSize(13).fillColor(INK).text(fit(doc, [a.earId, a.name].filter(Boolean).join('  '), contentW), left, 66);
  const facts = [
    data.breed, a.variety, a.sex === 'buck' ? 'Buck' : 'Doe', data.birthDate ? `born ${data.birthDate}` : null,
    weightText(a, data.unit), a.registrationNo ? `Reg. ${a.registrationNo}` : null, a.grandChampion ? 'Grand champion' : null,
  ].filter(Boolean).join('  ·  ');
  doc.font('plex').fontSize(9.5).text(fit(doc, facts, contentW), left, 86);
  doc.fillColor(MUTED).text(fit(doc, `Breeder: ${a.breeder ?? data.rabbitry}`, contentW), left, 100);

  // Four columns of ancestors; generation g has 2^g places, each an equal share of the height.
  const top = 126;
  const bottom = pageH - 72;
  const colW = contentW / CERTIFICATE_GENERATIONS;
  const labels = ['Parents', 'Grandparents', 'Great-grandparents', 'Great-great-grandparents'];
  doc.font('plex-bold').fontSize(7.5).fillColor(MUTED);
  labels.forEach((l, g) => doc.text(l, left + g * colW + 4, top - 12, { width: colW - 8, lineBreak: false }));

  const place = (node: PedigreeTreeNode | null | undefined, g: number, index: number) => {
    const h = (bottom - top) / 2 ** (g + 1);
    const x = left + g * colW;
    const y = top + index * h;
    doc.lineWidth(0.5).strokeColor(RULE).rect(x + 2, y + 1, colW - 4, h - 2).stroke();
    const size = [9, 8.5, 8, 7][g]!;
    const lineH = size * 1.22;
    const lines: { text: string; bold?: boolean; muted?: boolean }[] = [];
    const role = index % 2 === 0 ? 'Sire' : 'Dam';
    // null: this parent is not recorded; undefined: a place above an unrecorded one, left blank.
    if (node === null) {
      lines.push({ text: `${role}: not recorded`, muted: true });
    } else if (node) {
      lines.push({ text: `${node.earId}${node.grandChampion ? '  GC' : ''}`, bold: true });
      if (node.name) lines.push({ text: node.name });
      const vw = [node.variety, weightText(node, data.unit)].filter(Boolean).join(' · ');
      if (vw) lines.push({ text: vw });
      if (node.registrationNo) lines.push({ text: `Reg. ${node.registrationNo}` });
      if (g < 2 && node.breeder) lines.push({ text: `Breeder: ${node.breeder}`, muted: true });
      if (node.isStub && g < 3) lines.push({ text: 'outside the herd', muted: true });
    }
    const room = Math.max(1, Math.floor((h - 6) / lineH));
    const shown = lines.slice(0, room);
    let ty = y + Math.max(3, (h - shown.length * lineH) / 2);
    for (const l of shown) {
      doc.font(l.bold ? 'plex-bold' : 'plex').fontSize(size).fillColor(l.muted ? MUTED : INK);
      doc.text(fit(doc, l.text, colW - 12), x + 6, ty, { lineBreak: false });
      ty += lineH;
    }
    if (g + 1 < CERTIFICATE_GENERATIONS) {
      place(node?.sire, g + 1, index * 2);
      place(node?.dam, g + 1, index * 2 + 1);
    }
  };
  place(a.sire, 0, 0);
  place(a.dam, 0, 1);

  // Footer.
  const unitWord = data.unit === 'kg' ? 'kilograms' : 'pounds and ounces';
  doc.font('plex').fontSize(7.5).fillColor(MUTED)
    .text(`GC = grand champion  ·  Reg. = registration number  ·  Weights in ${unitWord}, the latest recorded`, left, bottom + 10, { width: contentW });
  doc.font('plex-bold').fontSize(8).fillColor(INK).text(CERTIFICATE_FOOTER, left, bottom + 24, { width: contentW });
  doc.end();
  return done;
}
