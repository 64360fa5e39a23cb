import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { settle, stubChartEnvironment } from '../panels/chart-stubs';
import { signInAs, userWith } from '../session/test-users';
import { heritabilityReport } from './trait-fixtures';
import { TraitInheritance } from './trait-inheritance';

const url = '/api/rabbitries/7/analytics/heritability';

// The first test also loads ECharts; the machine is shared, so time is generous.
describe('TraitInheritance', { timeout: 30_000 }, () => {
  let backend: HttpTestingController;
  let harness: RouterTestingHarness;
  let el: HTMLElement;

  beforeAll(() => stubChartEnvironment());
  afterEach(() => backend.verify());

  async function open(address: string) {
    TestBed.configureTestingModule({
      providers: [provideRouter([{ path: 'r/:rabbitryId/traits', component: TraitInheritance }], withComponentInputBinding()), provideHttpClient(), provideHttpClientTesting()],
    });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'mentor' }] }));
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(address);
    el = harness.routeNativeElement!;
    await settle();
    backend.match('/api/breeds').forEach((r) => r.flush({ breeds: [] }));
  }

  async function answer(report: object, check?: (params: URLSearchParams) => void) {
    const req = backend.expectOne((r) => r.url === url);
    check?.(new URLSearchParams(req.request.params.toString()));
    req.flush(report);
    await settle();
  }

  it('puts the small-sample warnings first, then the reading and a row per method', async () => {
    await open('/r/7/traits');
    await answer(heritabilityReport(), (p) => expect(p.toString()).toBe(''));
    const warnings = el.querySelector('.warnings');
    expect(warnings?.textContent).toContain('Small samples: read with care');
    expect(warnings?.textContent).toContain('Only 11 sires');
    expect(warnings!.compareDocumentPosition(el.querySelector('.reading')!) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(el.querySelector('.verdict')?.textContent).toContain('Moderately heritable');
    expect([...el.querySelectorAll('tr.mat-mdc-row')].map((r) => r.getAttribute('data-method'))).toEqual(['sire-offspring', 'midparent-offspring', 'paternal-half-sib']);
    expect(el.querySelector('tr[data-method="midparent-offspring"] .tag')?.textContent).toBe('used for the reading');
  });

  it('pools every herd the user may see when asked, and says so in the address', async () => {
    await open('/r/7/traits?trait=body_type');
    await answer(heritabilityReport(), (p) => expect(p.get('trait')).toBe('body_type'));
    el.querySelector<HTMLButtonElement>('mat-slide-toggle button')!.click();
    await settle();
    expect(TestBed.inject(Router).url).toBe('/r/7/traits?trait=body_type&scope=all');
    await answer(heritabilityReport({ scope: { kind: 'pooled', rabbitries: [], description: 'Pooled over the 2 rabbitries you may see.' } }), (p) => expect(p.get('scope')).toBe('all'));
    expect(el.querySelector('.scope')?.textContent).toContain('Pooled over the 2 rabbitries');
  });

  it('says when the trait has no records yet', async () => {
    await open('/r/7/traits');
    await answer(heritabilityReport({ counts: { animalsWithRecord: 0, sires: 0, dams: 0, sireFamilies: 0, damFamilies: 0, midparentFamilies: 0, halfSibSires: 0, halfSibOffspring: 0 } }));
    expect(el.textContent).toContain('No records of weight at 12 weeks yet');
  });
});
