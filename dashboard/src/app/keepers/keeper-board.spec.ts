import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router, withComponentInputBinding } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import type { RabbitryRole } from '@shared/contracts/roles';
import { KEEPER_CAUTIONS } from '@shared/domain/cautions';
import { settle, stubChartEnvironment } from '../panels/chart-stubs';
import { signInAs, userWith } from '../session/test-users';
import { KeeperBoard } from './keeper-board';
import { candidate, keepersReport } from './keeper-fixtures';

const board = keepersReport([
  candidate({
    id: 1, earId: 'BF177', rank: 1, z: [1.27, 0, 0.45, -0.45, 0.45],
    explanation: ['Ranked 1st of 2: strong breeding value for weight at 12 weeks; projected senior weight 3 lb 15 oz, 7 % under the ideal.'],
  }),
  candidate({
    id: 2, earId: 'BF175', rank: 2, z: [-1.48, 0.04, 0.8, 1.79, -1.79], keeperDecision: 'sell', disqualificationRisk: true,
    weightFlags: [{ kind: 'projected', status: 'over-maximum', disqualificationRisk: true, message: 'Projected over the senior maximum: disqualification risk.' }],
  }),
]);
const savedAnimal = {
  id: 1, rabbitryId: 7, earId: 'BF177', name: null, sex: 'doe', variety: 'Blue', birthDate: '2026-07-18', status: 'active', isStub: false,
  breedId: 1, breed: 'Mini Rex', sireId: null, damId: null, litterId: null, line: null, registrationNo: null, grandChampion: false, breeder: null,
  stubWeightGrams: null, hasPhoto: false, notes: null, keeperDecision: 'keep',
};
const keepersUrl = '/api/rabbitries/7/analytics/keepers';

// The first test also loads ECharts; the machine is shared, so time is generous.
describe('KeeperBoard', { timeout: 30_000 }, () => {
  let backend: HttpTestingController;
  let harness: RouterTestingHarness;
  let el: HTMLElement;

  beforeAll(() => stubChartEnvironment());
  afterEach(() => backend.verify());

  async function openAs(role: RabbitryRole, url = '/r/7/keepers') {
    TestBed.configureTestingModule({
      providers: [
        provideRouter([{ path: 'r/:rabbitryId/keepers', component: KeeperBoard }], withComponentInputBinding()),
        provideHttpClient(),
        provideHttpClientTesting(),
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role }] }));
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(url);
    el = harness.routeNativeElement!;
    await settle();
    backend.match('/api/breeds').forEach((r) => r.flush({ breeds: [] }));
  }

  async function answer(report: object = board, check?: (params: URLSearchParams) => void) {
    const req = backend.expectOne((r) => r.url === keepersUrl);
    check?.(new URLSearchParams(req.request.params.toString()));
    req.flush(report);
    await settle();
  }

  const rowIds = () => [...el.querySelectorAll('tr.main-row')].map((r) => r.getAttribute('data-ear-id'));
  const toggles = () => el.querySelectorAll('mat-button-toggle-group');

  it('ranks the juniors with their explanation, marks the risk and lets the owner decide', async () => {
    await openAs('owner');
    await answer();
    expect(rowIds()).toEqual(['BF177', 'BF175']);
    expect(el.querySelector('.explain')?.textContent).toContain('Ranked 1st of 2: strong breeding value for weight at 12 weeks');
    expect(el.querySelectorAll('.risk')).toHaveLength(1);
    expect(toggles()).toHaveLength(2);
    expect(el.querySelector('aside[aria-label="Cautions"]')?.textContent).toContain(KEEPER_CAUTIONS[0]);
    expect(el.querySelector('.read-only')).toBeNull();
  });

  it('saves a decision chosen on the board', async () => {
    await openAs('partner');
    await answer();
    const keep = [...el.querySelectorAll<HTMLButtonElement>('tr.main-row button')].find((b) => b.textContent?.trim() === 'Keep')!;
    keep.click();
    await settle();
    const patch = backend.expectOne('/api/rabbitries/7/animals/1/keeper-decision');
    expect(patch.request.method).toBe('PATCH');
    expect(patch.request.body).toEqual({ decision: 'keep' });
    patch.flush(savedAnimal);
    await settle();
    expect(document.body.textContent).toContain('BF177: keep — saved.');
  });

  it('shows a mentor the board read-only, decisions as words', async () => {
    await openAs('mentor');
    await answer();
    expect(toggles()).toHaveLength(0);
    expect([...el.querySelectorAll('.decision')].map((d) => d.textContent?.trim())).toEqual(['Not decided', 'Sell']);
    expect(el.querySelector('.read-only')?.textContent).toContain('as a mentor');
  });

  it('asks again with the new weights a moment after a slider moves, and keeps them in the address', async () => {
    await openAs('owner', '/r/7/keepers?weights=inbreeding:0');
    await answer(board, (p) => expect(p.get('weights')).toBe('inbreeding:0'));
    const slider = el.querySelector<HTMLInputElement>('#weight-weightOnTarget')!;
    slider.value = '5';
    slider.dispatchEvent(new Event('input'));
    slider.dispatchEvent(new Event('change'));
    await new Promise((r) => setTimeout(r, 450));
    await settle();
    expect(TestBed.inject(Router).url).toBe('/r/7/keepers?weights=weightOnTarget:5,inbreeding:0');
    await answer(board, (p) => expect(p.get('weights')).toBe('weightOnTarget:5,inbreeding:0'));
    // A component weighted 0 has no column.
    expect(el.querySelector('th.mat-column-inbreeding')).toBeNull();
  });

  it('says there is nothing to rank, and shows a failure with a way to try again', async () => {
    await openAs('owner');
    await answer(keepersReport([], { warnings: ['No active juniors (under 6 months) in this rabbitry to rank.'] }));
    expect(el.textContent).toContain('No juniors to rank yet');
    expect(el.querySelector('.warnings')?.textContent).toContain('No active juniors');

    await harness.navigateByUrl('/r/7/keepers?trait=weight_16w');
    TestBed.tick();
    backend.expectOne((r) => r.url === keepersUrl).flush({ error: { code: 'boom', message: 'The ranking failed.' } }, { status: 500, statusText: 'Server Error' });
    await settle();
    expect(el.querySelector('kl-load-error')?.textContent).toContain('The ranking failed.');
  });
});
