import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ClubRole } from '@shared/contracts/roles';
import type { Show, ShowDetail, ShowResult } from '@shared/contracts/shows';
import { signInAs, userWith } from '../session/test-users';
import { ShowResults } from './show-results';
import { Shows } from './shows';

const show: Show = { id: 4, name: 'Quill Winter Show', showDate: '2026-01-17', location: 'Ostwick Hall', hostClub: null, judges: ['R. Ambleforth'], sanctionNo: 'QV26-0117', results: 2 };
const detail: ShowDetail = {
  ...show,
  counts: { classes: 1, breeds: 1, exhibitors: 1, matched: 0, ageClassMismatches: 0 },
  judging: [{ judge: 'R. Ambleforth', classes: 1, results: 2 }],
};
const result = (id: number, placing: number, awards: ShowResult['awards'] = []): ShowResult => ({
  id, showId: 4, showName: show.name, showDate: show.showDate, earId: `W${id}`, exhibitor: 'Larrimore Glen Rabbits', breed: 'Mini Rex', variety: 'Black',
  sex: 'buck', ageClass: 'junior', entriesInClass: 4, exhibitorsInClass: 3, placing, awards, judge: 'R. Ambleforth', matched: false,
  computedAgeClass: null, ageClassMismatch: false,
});

async function setUp(role: ClubRole) {
  TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
  await signInAs(userWith({ clubs: [{ id: 3, name: 'Saltmeadow Fanciers', role }] }));
  return TestBed.inject(HttpTestingController);
}

describe('ShowResults', () => {
  let fixture: ComponentFixture<ShowResults>;
  let backend: HttpTestingController;
  afterEach(() => backend.verify());

  async function open(role: ClubRole) {
    backend = await setUp(role);
    fixture = TestBed.createComponent(ShowResults);
    fixture.componentRef.setInput('clubId', '3');
    fixture.componentRef.setInput('showId', '4');
    TestBed.tick();
    backend.expectOne('/api/clubs/3/shows/4/results').flush({ results: [result(2, 2), result(1, 1, ['BOV', 'BOB'])] });
    backend.expectOne('/api/clubs/3/shows/4').flush(detail);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('lists the classes in show order with placings among entries and awards spelled out', async () => {
    const el = await open('member');
    expect(el.querySelector('h1')?.textContent).toBe('Quill Winter Show');
    expect(el.querySelector('.counts')?.textContent).toBe("1 class of 1 breed · 2 results from 1 exhibitor, 0 matched to members' herds.");
    expect([...el.querySelectorAll('.judging li')].map((li) => li.textContent)).toEqual(['R. Ambleforth: 1 class (2 results)']);
    const rows = [...el.querySelectorAll('tr.mat-mdc-row')].map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.replace(/\s+/g, ' ').trim()));
    expect(rows[0].slice(0, 2)).toEqual(['Mini Rex · Black · Junior buck', '1st of 4']);
    expect(rows[0][6]).toBe('BOV (Best of variety) BOB (Best of breed)');
    expect(el.querySelector('a[download]')?.getAttribute('href')).toBe('/api/clubs/3/shows/4/results?format=csv');
    expect(el.textContent).not.toContain('Delete');
  });

  it('lets an officer delete a result', async () => {
    const el = await open('officer');
    expect([...el.querySelectorAll('td button')].map((b) => b.getAttribute('aria-label'))).toEqual([
      'Delete the result of Larrimore Glen Rabbits, Mini Rex · Black · Junior buck',
      'Delete the result of Larrimore Glen Rabbits, Mini Rex · Black · Junior buck',
    ]);
  });
});

describe('Shows', () => {
  let backend: HttpTestingController;
  afterEach(() => backend.verify());

  it('lists the season’s shows with their result counts and links', async () => {
    backend = await setUp('member');
    const fixture = TestBed.createComponent(Shows);
    fixture.componentRef.setInput('clubId', '3');
    TestBed.tick();
    const old = { ...show, id: 1, name: 'Autumn Show', showDate: '2025-10-04', results: 30 };
    backend.expectOne('/api/clubs/3/shows').flush({ shows: [show, old] });
    backend.expectOne('/api/clubs/3').flush({
      id: 3, name: 'Saltmeadow Fanciers', region: null, seasonStart: '2026-01-01', seasonEnd: '2026-12-31', role: 'member',
      counts: { members: 4, shows: 2, results: 32 },
    });
    await fixture.whenStable();
    const el = fixture.nativeElement as HTMLElement;
    expect([...el.querySelectorAll('tr.mat-mdc-row')].map((tr) => tr.querySelector('a')?.textContent)).toEqual(['Quill Winter Show']);
    expect(el.querySelector('tr.mat-mdc-row a')?.getAttribute('href')).toBe('/c/3/shows/4');
    expect(el.textContent?.replace(/\s+/g, ' ')).toContain('1 show, 2 results, season 2026-01-01 to 2026-12-31.');
    expect(el.textContent).not.toContain('Import results');
  });
});
