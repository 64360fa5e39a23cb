import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import type { PedigreeTreeNode } from '@shared/contracts/animals';
import { CERTIFICATE_FOOTER, renderPedigreePdf } from './pedigree-pdf';

/** A full tree: ancestor at path p (S/D letters) has ear ID `X-<p>`; generation 4 complete. */
function tree(path: string, depth: number): PedigreeTreeNode {
  const node: PedigreeTreeNode = {
    id: path.length + 1, earId: `X-${path || 'ROOT'}`, name: path === 'S' ? 'Sire Name' : null, sex: path.endsWith('D') ? 'doe' : 'buck',
    variety: 'Blue', weightGrams: 2608, registrationNo: path === 'S' ? 'R123' : null, grandChampion: path === 'SS', breeder: null, isStub: false,
  };
  if (depth < 4) return { ...node, sire: tree(`${path}S`, depth + 1), dam: path === 'D' ? null : tree(`${path}D`, depth + 1) };
  return node;
}

async function text(buf: Buffer) {
  const parser = new PDFParse({ data: buf });
  try {
    const r = await parser.getText();
    return { text: r.text, pages: r.total };
  } finally {
    await parser.destroy();
  }
}

describe('renderPedigreePdf', () => {
  it('prints every ancestor of four generations on one page, with weights in the reader\'s unit and the footer', async () => {
    const pdf = await renderPedigreePdf({
      tree: tree('', 0), breed: 'Test Compact', birthDate: '2025-10-01', rabbitry: 'Invented Rabbitry',
      printedOn: '2026-05-01', unit: 'lb-oz', paper: 'letter',
    });
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const { text: t, pages } = await text(pdf);
    expect(pages).toBe(1);
    // 2 + 4 + 8 + 16 places; the dam's dam (DD) is not recorded, so DD and its 6 ancestors are absent.
    const paths = ['S', 'D', 'SS', 'SD', 'DS', 'SSS', 'SSD', 'SDS', 'SDD', 'DSS', 'DSD', 'SSSS', 'SSSD', 'SSDS', 'SSDD', 'SDSS', 'SDSD', 'SDDS', 'SDDD', 'DSSS', 'DSSD', 'DSDS', 'DSDD'];
    for (const p of paths) expect(t, p).toContain(`X-${p}`);
    expect(t).toMatch(/X-SS\s+GC/);
    expect(t).toContain('Reg. R123');
    expect(t).toContain('Dam: not recorded');
    // 2608 g = 5 lb 12 oz (5 × 453.59237 + 12 × 28.349523125 = 2608.2 g; NIST Handbook 44 App. C).
    expect(t).toContain('Blue · 5 lb 12 oz');
    expect(t).toContain('Invented Rabbitry');
    expect(t).toContain('Printed 2026-05-01');
    expect(t.replace(/\s+/g, ' ')).toContain(CERTIFICATE_FOOTER);
  });

  it('prints kilograms for a reader with the kg setting, on A4', async () => {
    const pdf = await renderPedigreePdf({
      tree: tree('', 0), breed: null, birthDate: null, rabbitry: 'Invented Rabbitry', printedOn: '2026-05-01', unit: 'kg', paper: 'a4',
    });
    const { text: t } = await text(pdf);
    expect(t).toContain('Blue · 2.61 kg');
    expect(pdf.toString('latin1')).toMatch(/\/MediaBox \[0 0 595\.2\d* 841\.8\d*\]/);
  });
});
