import { provideHttpClient } from '@angular/common/http';
import { LINE_CAUTIONS } from '@shared/domain/cautions';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';
import { provideRouter, Router } from '@angular/router';
import type { LinesReport } from '@shared/contracts/analytics';
import { signInAs, userWith } from '../session/test-users';
import { stubChartEnvironment } from '../panels/chart-stubs';
import { LineComparison } from './line-comparison';
import { PanelChart } from '../panels/panel-chart';

const summary = (n: number, median: number) => ({ n, min: median - 40, q1: median - 20, median, q3: median + 20, max: median + 40, mean: median + 1 });
const interval = (n: number, lower: number, upper: number) => ({ lower, upper, lowerRank: 2, upperRank: n - 1, coverage: 0.96, n });
const CAUTIONS = [...LINE_CAUTIONS];
const report: LinesReport = {
  scope: { kind: 'rabbitry', rabbitries: [{ id: 7, name: 'Brackenrow' }], description: 'Brackenrow only.' },
  asOf: '2026-12-01',
  warnings: ['1 group has fewer than 10 animals: their quartiles are rough.'],
  cautions: CAUTIONS,
  filtered: null,
  groupBy: 'line',
  groups: [{ key: 'Ember', label: 'Ember', animals: 146 }, { key: 'Slate', label: 'Slate', animals: 9 }],
  measures: [
    { key: 'weight_12w_percentile', label: 'Weight at 12 weeks (percentile of breed and sex)', unit: 'percentile', groups: [{ key: 'Ember', summary: summary(92, 52), medianInterval: interval(92, 45, 58) }, { key: 'Slate', summary: summary(8, 41), medianInterval: interval(8, 12, 77) }] },
    { key: 'placement_score', label: 'Placement score per show result', unit: 'score (0 = last, 1 = won)', groups: [{ key: 'Ember', summary: { n: 141, min: 0, q1: 0.4, median: 0.67, q3: 0.9, max: 1, mean: 0.64 }, medianInterval: interval(141, 0.6, 0.75) }, { key: 'Slate', summary: null, medianInterval: null }] },
  ],
};

describe('LineComparison', { timeout: 20_000 }, () => {
  let fixture: ComponentFixture<LineComparison>;
  let backend: HttpTestingController;
  let el: HTMLElement;

  beforeAll(stubChartEnvironment);
  afterEach(() => backend.verify());

  async function open(url = '/', answer: LinesReport | null = report) {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'mentor' }] }));
    await TestBed.inject(Router).navigateByUrl(url);
    fixture = TestBed.createComponent(LineComparison);
    fixture.componentRef.setInput('rabbitryId', '7');
    el = fixture.nativeElement;
    TestBed.tick();
    backend.expectOne('/api/breeds').flush({ breeds: [] });
    if (answer) {
      linesRequest().flush(answer);
      await fixture.whenStable();
    }
  }
  const linesRequest = () => backend.expectOne((r) => r.url === '/api/rabbitries/7/analytics/lines');
  const charts = () => fixture.debugElement.queryAll(By.directive(PanelChart)).map((c) => c.componentInstance as PanelChart);
  const rows = () => [...el.querySelectorAll('table.figures tr.mat-mdc-row')].map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.replace(/\s+/g, ' ').trim()));

  it('draws one box plot per measure with each group’s n, and the same figures in the table', async () => {
    await open();
    expect(charts().map((c) => (c.options() as { series: { type: string }[] }).series.map((s) => s.type))).toEqual([['boxplot', 'scatter'], ['boxplot', 'scatter']]);
    const axis = (charts()[1]!.options() as { xAxis: { axisLabel: { formatter: (v: string, i: number) => string } } }).xAxis.axisLabel;
    expect(axis.formatter('', 1)).toBe('Slate\n{small|no records}');
    expect(rows()).toEqual([
      ['Weight at 12 weeks (percentile of breed and sex)percentile', 'Ember', '92', '32', '52', '45–58', '72', '12–92', '53'],
      ['Weight at 12 weeks (percentile of breed and sex)percentile', 'Slate', '8 small', '21', '41', '12–77', '61', '1–81', '42'],
      ['Placement score per show resultscore (0 = last, 1 = won)', 'Ember', '141', '0.40', '0.67', '0.60–0.75', '0.90', '0.00–1.00', '0.64'],
      ['Placement score per show resultscore (0 = last, 1 = won)', 'Slate', '0 no records', '—', '—', '—', '—', '—', '—'],
    ]);
    expect(el.textContent).toContain('1 group has fewer than 10 animals');
    expect(el.querySelector('kl-cautions-note')?.textContent).toContain(LINE_CAUTIONS[0]);
  });

  it('asks the API for the breed, sex and birth dates the address holds, and says them', async () => {
    await open('/?breed=2&sex=doe&from=2025-01-01&to=2025-12-31', null);
    const request = linesRequest();
    expect(request.request.params.keys().sort()).toEqual(['breed', 'from', 'groupBy', 'sex', 'to']);
    expect(request.request.params.get('breed')).toBe('2');
    expect(request.request.params.get('sex')).toBe('doe');
    request.flush({ ...report, filtered: 'Mini Rex does born 2025-01-01 to 2025-12-31' });
    await fixture.whenStable();
    expect(el.textContent).toContain('Brackenrow only. Mini Rex does born 2025-01-01 to 2025-12-31.');
    expect(el.querySelector<HTMLInputElement>('input[name="from"]')?.value).toBe('2025-01-01');
    [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Clear filters')!.click();
    // The address changes first (a navigation), then the report is asked for again.
    await new Promise((done) => setTimeout(done));
    TestBed.tick();
    const again = linesRequest();
    expect(again.request.params.keys()).toEqual(['groupBy']);
    again.flush(report);
    await fixture.whenStable();
  });

  it('shows one measure alone when the address names it, and asks for rabbitries when chosen', async () => {
    await open('/?measure=placement_score');
    expect(charts()).toHaveLength(1);
    expect(rows()).toHaveLength(2);
    await TestBed.inject(Router).navigateByUrl('/?groupBy=rabbitry');
    TestBed.tick();
    expect(linesRequest().request.params.get('groupBy')).toBe('rabbitry');
  });

  it('marks groups as small under the sample size the address asks for', async () => {
    await open('/?minN=5');
    expect(rows()[1]![2]).toBe('8');
    const axis = (charts()[0]!.options() as { xAxis: { axisLabel: { formatter: (v: string, i: number) => string } } }).xAxis.axisLabel;
    expect(axis.formatter('', 1)).toBe('Slate\n{n|n = 8}');
  });

  it('exports the figures as CSV', async () => {
    await open();
    let saved: Blob | null = null;
    vi.spyOn(URL, 'createObjectURL').mockImplementation((b) => { saved = b as Blob; return 'blob:x'; });
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Download CSV')!.click();
    const lines = (await saved!.text()).split('\r\n');
    expect(lines[0]).toBe('Measure,Unit,Group,Animals in group,n,Minimum,Lower quartile,Median,Median 95 % lower,Median 95 % upper,Interval coverage,Upper quartile,Maximum,Mean,Small group (n < 10)');
    expect(lines[2]).toBe('Weight at 12 weeks (percentile of breed and sex),percentile,Slate,9,8,1,21,41,12,77,0.96,61,81,42,yes');
  });

  it('shows loading, then an error with a way to try again', async () => {
    await open('/', null);
    expect(el.querySelector('mat-progress-bar')).not.toBeNull();
    linesRequest().flush({ error: { code: 'boom', message: 'The database is away.' } }, { status: 500, statusText: 'Server Error' });
    await fixture.whenStable();
    expect(el.querySelector('[role="alert"]')?.textContent).toContain('The database is away.');
  });

  it('says there is nothing to compare in a herd without animals', async () => {
    await open('/', { ...report, groups: [], measures: [], warnings: ['This rabbitry has no animals yet: lines need animals.'] });
    expect(el.querySelector('.kl-note h2')?.textContent).toBe('Nothing to compare yet');
    expect(charts()).toHaveLength(0);
  });
});
