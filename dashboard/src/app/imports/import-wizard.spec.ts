import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ImportJob, ImportSummary } from '@shared/contracts/imports';
import { signInAs, userWith } from '../session/test-users';
import { ImportWizard } from './import-wizard';

const summary: ImportSummary = {
  totalRows: 3, newRows: 1, alreadyPresent: 1, duplicatesInFile: 0, errorRows: 1, warningRows: 0, skippedRows: 0, stubsToCreate: 0,
  problems: [{ row: 4, field: 'weight', message: '"5.2" has no unit. Write the unit: "5 lb 12 oz", "5-12", "2.6 kg" or "2600 g"', severity: 'error' }],
};
const job = (over: Partial<ImportJob>): ImportJob => ({
  id: 5, kind: 'weights', scopeType: 'rabbitry', scopeId: 7, fileName: 'scale.csv', status: 'uploaded', encoding: 'utf-8', delimiter: ';',
  headers: ['Tattoo', 'Date', 'Weight'], sampleRows: [['BF101', '2026-11-20', '5 lb 12 oz']], suggestedMapping: { ear_id: 'Tattoo', weighed_on: 'Date', weight: 'Weight' },
  evaluationTraits: null, processedRows: 0, totalRows: 0, progress: null, summary: null, message: null, startedAt: '2026-11-30T10:00:00.000Z', finishedAt: null, userName: 'Wren Tallow',
  ...over,
});
const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('ImportWizard', () => {
  let fixture: ComponentFixture<ImportWizard>;
  let backend: HttpTestingController;
  let el: HTMLElement;
  let changes = 0;

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'owner' }] }));
    fixture = TestBed.createComponent(ImportWizard);
    fixture.componentRef.setInput('scope', { kind: 'rabbitry', id: '7' });
    fixture.componentInstance.changed.subscribe(() => changes++);
    el = fixture.nativeElement;
    await fixture.whenStable();
  });
  afterEach(() => backend.verify());

  const button = (label: string) => [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === label)!;
  async function click(label: string) {
    button(label).click();
    TestBed.tick();
  }
  async function chooseFile(text: string) {
    const input = el.querySelector<HTMLInputElement>('input[type="file"]')!;
    Object.defineProperty(input, 'files', { value: [new File([text], 'scale.csv', { type: 'text/csv' })], configurable: true });
    input.dispatchEvent(new Event('change'));
    await pause(20);
    await fixture.whenStable();
  }

  it('walks a file from the first look to the final count', async () => {
    [...el.querySelectorAll('mat-radio-button')].find((r) => r.textContent?.includes('Weights'))!.querySelector('input')!.click();
    await fixture.whenStable();
    expect(el.textContent).toContain('Weighed on*');

    await chooseFile('\uFEFFTattoo;Date;Weight\r\nBF101;2026-11-20;5 lb 12 oz\r\nBF102;2026-11-20;5.2\r\n');
    expect(el.querySelector('.preview')?.textContent).toContain('3 columns separated by semicolons, with a byte-order mark');
    expect([...el.querySelectorAll('.sample td')].map((td) => td.textContent)).toEqual(['BF101', '2026-11-20', '5 lb 12 oz', 'BF102', '2026-11-20', '5.2']);

    await click('Upload');
    const upload = backend.expectOne({ method: 'POST', url: '/api/rabbitries/7/imports' });
    const form = upload.request.body as FormData;
    expect(form.get('kind')).toBe('weights');
    expect((form.get('file') as File).name).toBe('scale.csv');
    upload.flush(job({}));
    await fixture.whenStable();
    expect(el.textContent).toContain('Received scale.csv: 3 columns separated by semicolons, read as UTF-8 text.');

    await click('Next: match the columns');
    await fixture.whenStable();
    expect(el.querySelector('.mapping')?.textContent).toContain('e.g. BF101');
    expect(button('Check the rows').disabled).toBe(false);

    await click('Check the rows');
    const check = backend.expectOne({ method: 'POST', url: '/api/rabbitries/7/imports/5/check' });
    expect(check.request.body).toEqual({ mapping: { ear_id: 'Tattoo', weighed_on: 'Date', weight: 'Weight' }, dateOrder: 'iso', unknownEarIds: 'skip' });
    check.flush(job({ status: 'checking' }));
    await fixture.whenStable();

    await pause(550);
    backend.expectOne('/api/rabbitries/7/imports/5').flush(job({ status: 'checking', processedRows: 2, progress: 0.6 }));
    await fixture.whenStable();
    expect(el.textContent).toContain('Checking: 2 rows read (60%)');
    const bar = el.querySelector('mat-progress-bar[aria-label="Check progress"]')!;
    expect([bar.getAttribute('mode'), bar.getAttribute('aria-valuenow')]).toEqual(['determinate', '60']);
    await pause(500);
    backend.expectOne('/api/rabbitries/7/imports/5').flush(job({ status: 'checked', processedRows: 3, totalRows: 3, summary }));
    await fixture.whenStable();
    expect(changes).toBe(1);
    expect([...el.querySelectorAll('.counts div')].map((d) => `${d.querySelector('dt')?.textContent} ${d.querySelector('dd')?.textContent}`)).toEqual([
      'Rows read 3', 'New 1', 'Already present 1', 'Rows with errors 1',
    ]);
    const problem = [...el.querySelectorAll('.problems tr.mat-mdc-row td')].map((td) => td.textContent?.trim());
    expect(problem).toEqual(['4', 'Weight (with unit)', 'error', summary.problems[0].message]);
    expect(el.querySelector<HTMLAnchorElement>('a[href$="problems.csv"]')?.getAttribute('href')).toBe('/api/rabbitries/7/imports/5/problems.csv');

    await click('Next: import');
    await fixture.whenStable();
    expect(button('Import').disabled).toBe(true);
    expect(el.textContent).toContain('1 row has errors. Fix the file and upload it again, or leave those rows out.');
    el.querySelector<HTMLInputElement>('mat-checkbox input')!.click();
    await fixture.whenStable();
    expect(button('Import').disabled).toBe(false);

    await click('Import');
    const commit = backend.expectOne({ method: 'POST', url: '/api/rabbitries/7/imports/5/commit' });
    expect(commit.request.body).toEqual({ skipRowsWithErrors: true });
    commit.flush(job({ status: 'committing', processedRows: 0, totalRows: 3, progress: 0, summary }));
    await fixture.whenStable();
    await pause(550);
    backend.expectOne('/api/rabbitries/7/imports/5').flush(job({ status: 'committing', processedRows: 1, totalRows: 3, progress: 0.75, summary }));
    await fixture.whenStable();
    expect(el.textContent).toContain('Importing: 1 of 1 new rows, 75%');
    expect(el.querySelector('mat-progress-bar[aria-label="Import progress"]')?.getAttribute('aria-valuenow')).toBe('75');
    await pause(500);
    backend.expectOne('/api/rabbitries/7/imports/5').flush(job({ status: 'done', processedRows: 3, totalRows: 3, summary, message: '1 new, 1 already present' }));
    await fixture.whenStable();
    expect(el.querySelector('.outcome')?.textContent).toBe('1 new, 1 already present');
    expect(changes).toBe(2);
  });

  it('shows the API’s reason when it refuses the file', async () => {
    await chooseFile('');
    await click('Upload');
    backend
      .expectOne({ method: 'POST', url: '/api/rabbitries/7/imports' })
      .flush({ error: { code: 'empty-file', message: 'The file is empty: choose a CSV file with a header row and at least one row of data' } }, { status: 400, statusText: 'Bad Request' });
    await fixture.whenStable();
    expect(el.querySelector('[role="alert"]')?.textContent).toContain('The file is empty: choose a CSV file with a header row and at least one row of data');
    expect(button('Choose another file')).toBeTruthy();
  });

  it('holds the check back until every required field has a column', async () => {
    await chooseFile('Tattoo;Pen\nBF101;3\n');
    await click('Upload');
    backend.expectOne({ method: 'POST', url: '/api/rabbitries/7/imports' }).flush(job({ kind: 'animals', headers: ['Tattoo', 'Pen'], suggestedMapping: { ear_id: 'Tattoo' } }));
    await fixture.whenStable();
    await click('Next: match the columns');
    await fixture.whenStable();
    expect(button('Check the rows').disabled).toBe(true);
    expect([...el.querySelectorAll('.blocking li')].map((li) => li.textContent)).toEqual(['Choose the column for Sex', 'Choose the column for Breed']);
    expect(el.textContent).toContain('Not imported: Pen.');
  });
});
