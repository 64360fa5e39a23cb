import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ImportJob } from '@shared/contracts/imports';
import { signInAs, userWith } from '../session/test-users';
import { Imports } from './imports';

const done: ImportJob = {
  id: 3, kind: 'animals', scopeType: 'rabbitry', scopeId: 7, fileName: 'herd.csv', status: 'done', encoding: 'utf-8', delimiter: ',',
  headers: [], sampleRows: [], suggestedMapping: {}, evaluationTraits: null, processedRows: 412, totalRows: 412, progress: null, message: '0 new, 412 already present',
  summary: { totalRows: 412, newRows: 0, alreadyPresent: 412, duplicatesInFile: 0, errorRows: 0, warningRows: 2, skippedRows: 0, stubsToCreate: 0, problems: [] },
  startedAt: '2026-11-30T10:00:00.000Z', finishedAt: '2026-11-30T10:00:04.000Z', userName: 'Wren Tallow',
};

describe('Imports', () => {
  let backend: HttpTestingController;
  afterEach(() => backend.verify());

  async function open(user: ReturnType<typeof userWith>, input: { rabbitryId?: string; clubId?: string }) {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(user);
    const fixture = TestBed.createComponent(Imports);
    for (const [k, v] of Object.entries(input)) fixture.componentRef.setInput(k, v);
    TestBed.tick();
    return { fixture, el: fixture.nativeElement as HTMLElement };
  }

  it('shows a mentor the history read-only, with the outcome and the problems report', async () => {
    const { fixture, el } = await open(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'mentor' }] }), { rabbitryId: '7' });
    backend.expectOne('/api/rabbitries/7/imports').flush({ imports: [done] });
    await fixture.whenStable();
    expect(el.querySelector('kl-import-wizard')).toBeNull();
    expect(el.querySelector('.kl-note')?.textContent).toContain('Only the owner and partners import files');
    const cells = [...el.querySelectorAll('tr.mat-mdc-row td')].map((td) => td.textContent?.replace(/\s+/g, ' ').trim());
    expect(cells.slice(1, 5)).toEqual(['herd.csv Animals and pedigrees', 'Wren Tallow', 'Imported', '0 new, 412 already present']);
    expect(el.querySelector('td a[download]')?.getAttribute('href')).toBe('/api/rabbitries/7/imports/3/problems.csv');
  });

  it('tells a club member that officers import results, and asks the API nothing', async () => {
    const { fixture, el } = await open(userWith({ clubs: [{ id: 3, name: 'Saltmeadow Fanciers', role: 'member' }] }), { clubId: '3' });
    await fixture.whenStable();
    expect(el.querySelector('.kl-note')?.textContent).toContain('Only the club’s officers import show results.');
    expect(el.querySelector('kl-import-history')).toBeNull();
  });

  it('gives an officer the wizard for show results only', async () => {
    const { fixture, el } = await open(userWith({ clubs: [{ id: 3, name: 'Saltmeadow Fanciers', role: 'officer' }] }), { clubId: '3' });
    backend.expectOne('/api/clubs/3/imports').flush({ imports: [] });
    await fixture.whenStable();
    expect(el.querySelector('kl-import-wizard')).not.toBeNull();
    expect(el.querySelectorAll('mat-radio-button[value]').length).toBe(0);
    expect(el.textContent).toContain('A file of show results.');
    expect(el.textContent).toContain('No files imported yet.');
  });
});
