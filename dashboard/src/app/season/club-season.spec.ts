import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';
import { provideRouter, Router } from '@angular/router';
import type { SeasonReport } from '@shared/contracts/analytics';
import type { Club } from '@shared/contracts/clubs';
import type { ClubRole } from '@shared/contracts/roles';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { stubChartEnvironment } from '../panels/chart-stubs';
import { PanelChart } from '../panels/panel-chart';
import { signInAs, userWith } from '../session/test-users';
import { ClubSeason } from './club-season';

const club: Club = {
  id: 3, name: 'Saltmeadow Fanciers', region: null, seasonStart: '2026-01-01', seasonEnd: '2026-11-30', role: 'officer',
  counts: { members: 6, shows: 3, results: 420 },
};
const standing = (rank: number, exhibitor: string, points: number, isMember: boolean, breed: string | null = null) => ({
  exhibitor, breed, points, results: 40, firsts: 9, awards: 4, rank, isMember,
});
const report: SeasonReport = {
  club: { id: 3, name: 'Saltmeadow Fanciers' },
  from: '2026-01-01',
  to: '2026-11-30',
  warnings: [],
  formula: { kind: 'multiplied', base: [6, 4, 3, 2, 1] },
  formulaIsDefault: true,
  totals: { shows: 2, results: 420, exhibitors: 3, memberResults: 150, matchedResults: 150 },
  standings: {
    byExhibitor: [standing(1, 'Ottersley Warren', 3812, false), standing(2, 'Tinderbrook Hollow', 2946, true), standing(3, 'Brackenfold Rabbitry', 2864, true)],
    byExhibitorBreed: [
      standing(1, 'Marrowind Farm', 2366, true, 'Californian'), standing(2, 'Drummelow Rex', 644, false, 'Californian'),
      standing(1, 'Brackenfold Rabbitry', 2864, true, 'Mini Rex'),
    ],
  },
  cumulative: {
    dates: ['2026-01-17', '2026-02-14'],
    series: [
      { exhibitor: 'Ottersley Warren', isMember: false, points: [299, 3812] },
      { exhibitor: 'Tinderbrook Hollow', isMember: true, points: [120, 2946] },
      { exhibitor: 'Brackenfold Rabbitry', isMember: true, points: [300, 2864] },
    ],
    totalExhibitors: 3,
  },
  entries: {
    shows: [{ id: 1, name: 'Winter Show', date: '2026-01-17' }, { id: 2, name: 'February Open', date: '2026-02-14' }],
    breeds: ['Californian', 'Mini Rex'],
    counts: [[37, 72], [41, 47]],
    byBreed: [{ breed: 'Californian', entries: 78 }, { breed: 'Mini Rex', entries: 119 }],
  },
  legs: [{ exhibitor: 'Brackenfold Rabbitry', isMember: true, legs: 35, animalsWithLegs: 11, grandChampionsCompleted: 4 }],
  topSires: [{
    sire: { id: 100, earId: 'BF092', name: 'Marlow' }, exhibitor: 'Brackenfold Rabbitry', rank: 1, entries: 6, offspringShown: 2,
    // Wilson 95 % interval of 5 of 6 (Newcombe 1998, method 3): 0.436–0.970.
    topK: { count: 5, n: 6, share: 5 / 6, lower: 0.4365, upper: 0.9699 },
    meanPlacementScore: { mean: 0.77, se: 0.08, n: 6 },
    placementIndex: { index: 1.26, lower: 1.12, upper: 1.12, observed: 5, expected: 3.97 },
    legs: 7, shrunkenShare: 0.8,
  }],
};

describe('ClubSeason', { timeout: 20_000 }, () => {
  let fixture: ComponentFixture<ClubSeason>;
  let backend: HttpTestingController;
  let el: HTMLElement;

  beforeAll(stubChartEnvironment);
  afterEach(() => backend.verify());

  async function openAs(role: ClubRole, answer: SeasonReport = report, url = '/') {
    // The frame provides as-you-type error display to every screen in it.
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting(), validateAsYouType] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ clubs: [{ id: 3, name: 'Saltmeadow Fanciers', role }] }));
    await TestBed.inject(Router).navigateByUrl(url);
    fixture = TestBed.createComponent(ClubSeason);
    fixture.componentRef.setInput('clubId', '3');
    el = fixture.nativeElement;
    TestBed.tick();
    seasonRequest().flush(answer);
    backend.expectOne('/api/clubs/3').flush({ ...club, role });
    await fixture.whenStable();
  }
  const seasonRequest = () => backend.expectOne((r) => r.url === '/api/clubs/3/analytics/season');
  const button = (text: string) => [...el.querySelectorAll('button, a')].find((b) => b.textContent?.trim() === text) as HTMLElement | undefined;
  const standingRows = () => [...el.querySelectorAll('table.standings tr.mat-mdc-row')].map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.replace(/\s+/g, ' ').trim()));
  const type = (name: string, value: string) => {
    const input = el.querySelector<HTMLInputElement>(`input[name="${name}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  };

  it('shows the standings by exhibitor with members marked, and the formula in words', async () => {
    await openAs('member');
    expect(standingRows()).toEqual([
      ['1', 'Ottersley Warren', '3,812', '40', '9', '4'],
      ['2', 'Tinderbrook Hollow member', '2,946', '40', '9', '4'],
      ['3', 'Brackenfold Rabbitry member', '2,864', '40', '9', '4'],
    ]);
    expect(el.querySelector('.kl-lede')?.textContent?.replace(/\s+/g, ' ')).toContain('Points: 6/4/3/2/1 × animals in the class (the common base, which the club keeps)');
  });

  it('draws the points lines and the stacked entries, with their legends’ names', async () => {
    await openAs('member');
    const charts = fixture.debugElement.queryAll(By.directive(PanelChart)).map((c) => c.componentInstance.options() as { series: { type: string; name: string }[] });
    expect(charts.map((o) => o.series.map((s) => `${s.type} ${s.name}`))).toEqual([
      ['line Ottersley Warren', 'line Tinderbrook Hollow', 'line Brackenfold Rabbitry'],
      ['bar Californian', 'bar Mini Rex'],
    ]);
    expect(el.querySelector('.sires')?.textContent).toContain('few results');
    expect(el.querySelector('.sires')?.textContent).toContain('44 %–97 %');
  });

  it('narrows the per-breed standings to a breed from the address and asks for the period asked', async () => {
    await openAs('member', report, '/?from=2026-03-01&standings=breed&breed=Californian');
    // The first request above was already answered; this checks what it asked for.
    await TestBed.inject(Router).navigateByUrl('/?from=2026-04-01&standings=breed&breed=Californian');
    TestBed.tick();
    const request = seasonRequest();
    expect(request.request.params.get('from')).toBe('2026-04-01');
    expect(request.request.params.has('to')).toBe(false);
    request.flush(report);
    await fixture.whenStable();
    expect(standingRows().map((r) => r.slice(0, 3))).toEqual([['1', 'Marrowind Farm member', 'Californian'], ['2', 'Drummelow Rex', 'Californian']]);
  });

  it('gives a member no formula editor', async () => {
    await openAs('member');
    expect(button('Season dates and points formula')).toBeUndefined();
    expect(el.querySelector('kl-season-settings')).toBeNull();
  });

  it('lets an officer change the formula, checking it as they type, and saves it', async () => {
    await openAs('officer');
    button('Season dates and points formula')!.click();
    await fixture.whenStable();
    const form = el.querySelector('kl-season-settings')!;
    [...form.querySelectorAll<HTMLElement>('mat-button-toggle button')].find((b) => b.textContent?.includes('Flat points'))!.click();
    await fixture.whenStable();
    type('place-2', '');
    type('bonus-BOB', '-3');
    await fixture.whenStable();
    expect([...form.querySelectorAll('mat-error')].map((e) => e.textContent?.trim())).toEqual(['Give the points for 2nd place', 'Points are 0 or more']);
    expect(button('Save season settings')!.hasAttribute('disabled')).toBe(true);

    type('place-2', '8');
    type('bonus-BOB', '10');
    type('seasonEnd', '2026-12-31');
    await fixture.whenStable();
    expect(form.querySelector('.preview')?.textContent).toContain('Best of breed: + 10');
    button('Save season settings')!.click();
    const put = backend.expectOne({ method: 'PUT', url: '/api/clubs/3/season' });
    expect(put.request.body).toEqual({
      seasonStart: '2026-01-01', seasonEnd: '2026-12-31', pointsFormula: { kind: 'flat', table: [6, 8, 3, 2, 1], bonuses: { BOB: 10 } },
    });
    put.flush({ clubId: 3, seasonStart: '2026-01-01', seasonEnd: '2026-12-31', pointsFormula: put.request.body.pointsFormula });
    TestBed.tick();
    backend.expectOne('/api/clubs/3').flush(club);
    seasonRequest().flush(report);
    await fixture.whenStable();
  });

  it('puts the club’s settings back on Undo, in the same fields', async () => {
    await openAs('officer');
    button('Season dates and points formula')!.click();
    await fixture.whenStable();
    const form = el.querySelector('kl-season-settings')!;
    [...form.querySelectorAll<HTMLElement>('mat-button-toggle button')].find((b) => b.textContent?.includes('× animals in class'))!.click();
    await fixture.whenStable();
    type('place-1', '');
    await fixture.whenStable();
    expect(form.querySelectorAll('mat-error')).toHaveLength(1);
    button('Undo changes')!.click();
    await fixture.whenStable();
    const places = [...form.querySelectorAll<HTMLInputElement>('input[name^="place-"]')];
    expect(places.map((i) => [i.value, i.disabled])).toEqual([['6', true], ['4', true], ['3', true], ['2', true], ['1', true]]);
    expect(form.querySelectorAll('mat-error')).toHaveLength(0);
  });

  it('says an officer should import results when the season has none, with the way there', async () => {
    const empty = { ...report, totals: { ...report.totals, results: 0 }, warnings: ['The club’s shows in this period have no results yet: an officer imports them.'] };
    await openAs('officer', empty);
    expect(el.querySelector('.empty h2')?.textContent).toBe('No results imported for this season yet — import results');
    expect(button('Import results')?.getAttribute('href')).toBe('/c/3/imports');
  });

  it('gives a member the empty season without the import link', async () => {
    await openAs('member', { ...report, totals: { ...report.totals, results: 0 } });
    expect(el.querySelector('.empty h2')?.textContent).toBe('No results imported for this season yet — import results');
    expect(button('Import results')).toBeUndefined();
  });

  it('says so when the season cannot be loaded', async () => {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ clubs: [{ id: 3, name: 'Saltmeadow Fanciers', role: 'member' }] }));
    fixture = TestBed.createComponent(ClubSeason);
    fixture.componentRef.setInput('clubId', '3');
    el = fixture.nativeElement;
    TestBed.tick();
    seasonRequest().flush({ error: { code: 'boom', message: 'The database is away.' } }, { status: 500, statusText: 'Server Error' });
    backend.expectOne('/api/clubs/3').flush(club);
    await fixture.whenStable();
    expect(el.querySelector('[role="alert"]')?.textContent).toContain('The database is away.');
  });
});
