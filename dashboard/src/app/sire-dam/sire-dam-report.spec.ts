import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { settle, stubChartEnvironment } from '../panels/chart-stubs';
import { signInAs, userWith } from '../session/test-users';
import { parent, placementReport } from './sire-dam-fixtures';
import { SireDamReport } from './sire-dam-report';

const placementUrl = '/api/rabbitries/7/analytics/placement';

// The first test also loads ECharts; the machine is shared, so time is generous.
describe('SireDamReport', { timeout: 30_000 }, () => {
  let backend: HttpTestingController;
  let harness: RouterTestingHarness;
  let el: HTMLElement;

  beforeAll(() => stubChartEnvironment());
  afterEach(() => backend.verify());

  async function open(url: string) {
    TestBed.configureTestingModule({
      providers: [provideRouter([{ path: 'r/:rabbitryId/sires-dams', component: SireDamReport }], withComponentInputBinding()), provideHttpClient(), provideHttpClientTesting()],
    });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'owner' }] }));
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(url);
    el = harness.routeNativeElement!;
    await settle();
    backend.match('/api/breeds').forEach((r) => r.flush({ breeds: [] }));
  }

  async function answer(report: object, check?: (params: URLSearchParams) => void) {
    const req = backend.expectOne((r) => r.url === placementUrl);
    check?.(new URLSearchParams(req.request.params.toString()));
    req.flush(report);
    await settle();
  }

  it('lists the parents with sample sizes and small samples marked, each linked to its animal', async () => {
    await open('/r/7/sires-dams');
    await answer(placementReport([parent(1, 'BF053', 1, 24, 22), parent(2, 'BF092', 2, 15, 15)]));
    const rows = [...el.querySelectorAll('tr.mat-mdc-row')];
    expect(rows.map((r) => r.getAttribute('data-ear-id'))).toEqual(['BF053', 'BF092']);
    expect(rows[1]!.querySelector('.small-sample')?.textContent).toBe('small sample');
    expect(rows[0]!.querySelector('a')?.getAttribute('href')).toBe('/r/7/animals/1');
    expect(el.querySelector('.summary')?.textContent).toContain('82 % (74–87 %)');
  });

  it('asks for dams placed in the top 5 from the address, and changes the address when the toggle moves', async () => {
    await open('/r/7/sires-dams?parent=dam&k=5&minEntries=3');
    await answer(placementReport([], { parentKind: 'dam', k: 5 }), (p) => {
      expect(p.get('parent')).toBe('dam');
      expect(p.get('k')).toBe('5');
      expect(p.get('minEntries')).toBe('3');
    });
    expect(el.textContent).toContain('No results imported for this season yet — import results');
    const grandsires = [...el.querySelectorAll<HTMLButtonElement>('mat-button-toggle button')].find((b) => b.textContent?.includes('Grandsires'))!;
    grandsires.click();
    await settle();
    expect(TestBed.inject(Router).url).toBe('/r/7/sires-dams?parent=grandsire&k=5&minEntries=3');
    await answer(placementReport([parent(3, 'BF001', 1, 77, 60)], { parentKind: 'grandsire', k: 5 }), (p) => expect(p.get('parent')).toBe('grandsire'));
    expect(el.querySelectorAll('tr.mat-mdc-row')).toHaveLength(1);
  });

  it('tells results apart from parents: none listed under these filters', async () => {
    await open('/r/7/sires-dams?minEntries=100');
    await answer(placementReport([], { totals: { results: 141, offspringShown: 45, parents: 8, parentsListed: 0 } }));
    expect(el.textContent).toContain('No sires match these filters');
    expect(el.textContent).not.toContain('import results');
  });
});
