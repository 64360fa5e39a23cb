import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, TestRequest } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import type { HerdPage, HerdRow } from '@shared/contracts/animals';
import type { RabbitryRole } from '@shared/contracts/roles';
import { signInAs, userWith } from '../session/test-users';
import { Herd } from './herd';

const row = (id: number, earId: string, over: Partial<HerdRow> = {}): HerdRow => ({
  id, earId, name: null, sex: 'doe', breedId: 2, breed: 'Mini Rex', variety: 'Castor', birthDate: '2026-05-15', ageDays: 199,
  ageClass: 'senior', line: 'Ember', status: 'active', isStub: false, registrationNo: null, latestWeightGrams: 2608,
  latestWeighedOn: '2026-11-20', legs: 0, grandChampion: false, keeperDecision: null, ...over,
});
const page = (rows: HerdRow[], total = rows.length): HerdPage => ({ rows, total, page: 1, pageSize: 50 });

describe('Herd', () => {
  let fixture: ComponentFixture<Herd>;
  let backend: HttpTestingController;
  let el: HTMLElement;

  const herdRequest = () => backend.expectOne((r) => r.url === '/api/rabbitries/7/animals');
  async function openAs(role: RabbitryRole, answer: (r: TestRequest) => void) {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role }] }));
    fixture = TestBed.createComponent(Herd);
    fixture.componentRef.setInput('rabbitryId', '7');
    el = fixture.nativeElement;
    TestBed.tick();
    backend.expectOne('/api/breeds').flush({ breeds: [] });
    backend.expectOne('/api/rabbitries/7/lines').flush({
      lines: [{ line: 'Ember', animals: 24, active: 18, outside: 2 }, { line: 'Marsh Gate', animals: 3, active: 3, outside: 0 }],
    });
    answer(herdRequest());
    await fixture.whenStable();
  }
  const buttons = () => [...el.querySelectorAll('button, a')].map((b) => b.textContent?.trim());

  afterEach(() => backend.verify());

  it('lists the herd with ear IDs linking to each animal and weights in the user’s unit', async () => {
    await openAs('owner', (r) => r.flush(page([row(1, 'BF101', { name: 'Sorrel', legs: 2 }), row(2, 'BF102', { grandChampion: true })], 120)));
    const cells = [...el.querySelectorAll('tr.mat-mdc-row')].map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.trim()));
    expect(cells[0]).toEqual(['BF101', 'Sorrel', 'Doe', 'Mini Rex', 'Castor', expect.stringMatching(/months$/), 'Senior', 'Ember', 'Active', '5 lb 12 oz', '2', '']);
    expect(cells[1].at(-1)).toBe('GC');
    expect(el.querySelector<HTMLAnchorElement>('a.ear-id')?.getAttribute('href')).toBe('/r/7/animals/1');
    expect(el.querySelector('mat-paginator')?.textContent).toContain('of 120');
    expect(el.querySelector<HTMLAnchorElement>('a[download]')?.getAttribute('href')).toBe('/api/rabbitries/7/animals?status=active&format=csv');
  });

  it('offers both ways in when the herd is empty', async () => {
    await openAs('partner', (r) => r.flush(page([])));
    expect(el.querySelector('.empty h2')?.textContent).toBe('No animals yet — import a file or add your first animal');
    expect(buttons()).toEqual(expect.arrayContaining(['Import a file', 'Add your first animal']));
  });

  it('gives a mentor no way to add animals', async () => {
    await openAs('mentor', (r) => r.flush(page([])));
    expect(buttons()).not.toContain('Add animal');
    expect(buttons()).not.toContain('Add your first animal');
    expect(el.querySelector('.empty')?.textContent).toContain('The owner or a partner of this rabbitry adds its animals.');
  });

  it('says so when the herd cannot be loaded, and tries again', async () => {
    await openAs('owner', (r) => r.flush({ error: { code: 'boom', message: 'The database is away.' } }, { status: 500, statusText: 'Server Error' }));
    expect(el.querySelector('[role="alert"]')?.textContent).toContain('The database is away.');
    [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Try again')!.click();
    TestBed.tick();
    herdRequest().flush(page([row(1, 'BF101')]));
    await fixture.whenStable();
    expect(el.querySelectorAll('tr.mat-mdc-row')).toHaveLength(1);
  });

  it('keeps filters in the address and asks the API for the filtered page', async () => {
    await openAs('owner', (r) => r.flush(page([row(1, 'BF101')], 60)));
    await TestBed.inject(Router).navigate([], { queryParams: { sex: 'buck', ageClass: 'junior', page: '2' } });
    TestBed.tick();
    const request = herdRequest();
    expect(request.request.params.get('sex')).toBe('buck');
    expect(request.request.params.get('ageClass')).toBe('junior');
    expect(request.request.params.get('page')).toBe('2');
    expect(request.request.params.get('status')).toBe('active');
    request.flush(page([], 0));
    await fixture.whenStable();
    expect([...el.querySelectorAll('mat-chip')].map((c) => c.textContent?.replace('×', '').trim())).toEqual(['Bucks', 'Juniors today']);
    expect(el.querySelector('.kl-no-data')?.textContent?.trim()).toBe('No animals match these filters.');
    expect(el.querySelector<HTMLAnchorElement>('a[download]')?.getAttribute('href')).toBe('/api/rabbitries/7/animals?sex=buck&ageClass=junior&status=active&format=csv');
  });

  it('offers the herd’s lines with their counts as the line filter is typed', async () => {
    await openAs('owner', (r) => r.flush(page([row(1, 'BF101')])));
    const input = el.querySelector<HTMLInputElement>('input[name="line"]')!;
    input.dispatchEvent(new Event('focusin'));
    input.value = 'ga';
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    const options = [...document.querySelectorAll('mat-option')].map((o) => o.textContent?.replace(/\s+/g, ' ').trim());
    expect(options).toEqual(['Marsh Gate · 3 animals, 3 active']);
  });
});
