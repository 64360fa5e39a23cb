import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { settle, stubChartEnvironment } from '../panels/chart-stubs';
import { signInAs, userWith } from '../session/test-users';
import { GrowthCurves } from './growth-curves';
import { growthAnimal, growthReport, reference } from './growth-fixtures';

const url = '/api/rabbitries/7/analytics/growth';

// The first test also loads ECharts; the machine is shared, so time is generous.
describe('GrowthCurves', { timeout: 30_000 }, () => {
  let backend: HttpTestingController;
  let harness: RouterTestingHarness;
  let el: HTMLElement;

  beforeAll(() => stubChartEnvironment());
  afterEach(() => backend.verify());

  async function open(address: string, weightUnit: 'lb-oz' | 'kg' = 'lb-oz') {
    TestBed.configureTestingModule({
      providers: [provideRouter([{ path: 'r/:rabbitryId/growth', component: GrowthCurves }], withComponentInputBinding()), provideHttpClient(), provideHttpClientTesting()],
    });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ weightUnit, rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'owner' }] }));
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(address);
    el = harness.routeNativeElement!;
    await settle();
    backend.match('/api/breeds').forEach((r) => r.flush({ breeds: [] }));
    backend.match('/api/rabbitries/7/litters').forEach((r) => r.flush({ litters: [], caution: 'Gestation usually runs 31–32 days.' }));
  }

  async function answer(report: object, check?: (params: URLSearchParams) => void) {
    const req = backend.expectOne((r) => r.url === url);
    check?.(new URLSearchParams(req.request.params.toString()));
    req.flush(report);
    await settle();
  }

  it('draws the chosen animals with a table of their weighings and centiles in the user’s unit', async () => {
    await open('/r/7/growth?animals=1,2&sex=doe');
    await answer(growthReport({ animals: [growthAnimal(1, 'BF177'), growthAnimal(2, 'BF179')] }), (p) => {
      expect(p.get('animals')).toBe('1,2');
      expect(p.get('sex')).toBe('doe');
    });
    const weighings = () => [...el.querySelectorAll('.weighings-table tr.mat-mdc-row')].map((r) => [...r.querySelectorAll('td')].map((td) => td.textContent?.trim()).join(' | '));
    // Two growing weighings each; the adult one (287 days) waits behind a button.
    expect(weighings()).toHaveLength(4);
    // 1250 g = 44.09 oz → 2 lb 12 oz
    expect(weighings()[1]).toBe('BF177 | 2026-10-10 | 12 weeks | 2 lb 12 oz | 62nd centile');
    expect(el.querySelector('.animals-table')?.textContent).toContain('4 lb 3 oz (3 lb 15 oz – 4 lb 7 oz)');
    expect(el.textContent).toContain('2 weighings after 36 weeks are left off the chart.');
    el.querySelector<HTMLButtonElement>('button.later')!.click();
    await settle();
    expect(weighings()).toHaveLength(6);
    expect(weighings()[2]).toBe('BF177 | 2027-05-01 | 41 weeks | 4 lb 5 oz | —');
    expect(el.querySelector('.summary')?.textContent).toContain('Mini Rex does: 1074 weighings of 95 animals');
  });

  it('takes an animal off the chart from its chip', async () => {
    await open('/r/7/growth?animals=1,2');
    await answer(growthReport({ animals: [growthAnimal(1, 'BF177'), growthAnimal(2, 'BF179')] }));
    el.querySelector<HTMLButtonElement>('button[aria-label="Take BF177 off the chart"]')!.click();
    await settle();
    expect(TestBed.inject(Router).url).toBe('/r/7/growth?animals=2');
    await answer(growthReport({ animals: [growthAnimal(2, 'BF179')] }), (p) => expect(p.get('animals')).toBe('2'));
  });

  it('draws the bands of the breed and sex chosen, asking for both together', async () => {
    await open('/r/7/growth?animals=1');
    await answer(growthReport({ references: [reference('doe')], animals: [growthAnimal(1, 'BF177')] }));
    expect(el.querySelector('.summary')?.textContent).toContain('Mini Rex does');
    el.querySelectorAll<HTMLElement>('mat-select')[1]!.click();
    await settle();
    [...document.querySelectorAll<HTMLElement>('mat-option')].find((o) => o.textContent?.trim() === 'Bucks')!.click();
    await settle();
    expect(TestBed.inject(Router).url).toBe('/r/7/growth?animals=1&breed=1&sex=buck');
    await answer(growthReport({ references: [reference('buck'), reference('doe')], animals: [growthAnimal(1, 'BF177')] }), (p) => {
      expect(p.get('breed')).toBe('1');
      expect(p.get('sex')).toBe('buck');
    });
    expect(el.querySelector('.summary')?.textContent).toContain('Mini Rex bucks');
  });

  it('marks a projected disqualification risk in words', async () => {
    await open('/r/7/growth?animals=1', 'kg');
    const risky = growthAnimal(1, 'BF177', {
      projection: { ...growthAnimal(1, 'BF177').projection!, grams: 2100, check: { status: 'over-maximum', disqualificationRisk: true, gramsFromIdeal: 172 } },
      classification: 'Projected over the senior maximum: disqualification risk.',
    });
    await answer(growthReport({ animals: [risky] }));
    expect(el.querySelector('.animals-table .risk')?.textContent).toContain('Disqualification risk');
    expect(el.querySelector('.animals-table')?.textContent).toContain('2.10 kg');
  });

  it('asks for weights when the breed has none yet', async () => {
    await open('/r/7/growth');
    await answer(growthReport({ references: [{ ...reference('doe'), weighings: 0, animals: 0, bands: [] }] }));
    expect(el.textContent).toContain('No weighings recorded yet — import weights');
    expect(el.querySelector('a[href="/r/7/imports"]')).not.toBeNull();
  });
});
