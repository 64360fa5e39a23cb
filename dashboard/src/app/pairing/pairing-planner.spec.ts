import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';
import { provideRouter, Router } from '@angular/router';
import type { AnimalRef, PairingsReport, RelationshipReport } from '@shared/contracts/analytics';
import { BREEDING_CAUTIONS } from '@shared/domain/cautions';
import { stubChartEnvironment } from '../panels/chart-stubs';
import { PanelChart } from '../panels/panel-chart';
import { signInAs, userWith } from '../session/test-users';
import { PairingPlanner } from './pairing-planner';

const ref = (id: number, earId: string, sex: 'buck' | 'doe', name: string | null, over: Partial<AnimalRef> = {}): AnimalRef => ({
  id, rabbitryId: 7, earId, name, sex, breedId: 1, breed: 'Mini Rex', variety: 'Blue', line: 'Ember', birthDate: '2025-07-25', status: 'active', isStub: false, ...over,
});
const lark = ref(108, 'BF100', 'doe', 'Lark');
const ivy = ref(151, 'BF143', 'buck', 'Ivy II');
const cobble = ref(126, 'BF118', 'buck', 'Cobble II');
const sorrel = ref(140, 'BF132', 'doe', 'Sorrel', { line: 'Slate' });
const aster = ref(64, 'BF056', 'doe', 'Aster', { status: 'sold' });
const CAUTIONS = [...BREEDING_CAUTIONS];

const report: PairingsReport = {
  scope: { kind: 'rabbitry', rabbitries: [{ id: 7, name: 'Brackenrow' }], description: 'Brackenrow only.' },
  asOf: '2026-12-01',
  warnings: [],
  cautions: CAUTIONS,
  animal: { animal: lark, ebv: -0.1247, accuracy: 0.4119 },
  trait: { key: 'weight_12w', label: 'Weight at 12 weeks', kind: 'weight', unit: 'grams', standardAgeDays: 84, toleranceDays: 10 },
  breedingAgeDays: 152,
  candidatesConsidered: 2,
  candidates: [
    {
      rank: 1, mate: cobble, ageDays: 494, expectedInbreeding: 0.0234375, inbreedingLevel: 'low', mateEbv: 0.2326, mateAccuracy: 0.5371, expectedOffspringEbv: 0.054,
      commonAncestors: [], notes: [],
    },
    {
      rank: 2, mate: ivy, ageDays: 366, expectedInbreeding: 0.3046875, inbreedingLevel: 'high', mateEbv: 0.3233, mateAccuracy: null, expectedOffspringEbv: 0.0993,
      commonAncestors: [{ animal: aster, contribution: 0.140625, share: 0.4615 }, { animal: null, contribution: 0.0625, share: 0.2051 }],
      notes: ['High expected inbreeding: as close as a half-sib mating or closer.'],
    },
  ],
  matrix: { does: [lark, sorrel], bucks: [ivy, cobble], values: [[0.3046875, 0.0234375], [0, 0.125]], totalDoes: 2, totalBucks: 2, truncated: false },
};

describe('PairingPlanner', { timeout: 20_000 }, () => {
  let fixture: ComponentFixture<PairingPlanner>;
  let backend: HttpTestingController;
  let el: HTMLElement;

  beforeAll(stubChartEnvironment);
  beforeEach(() => localStorage.clear());
  afterEach(() => backend.verify());

  async function open(url: string) {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'owner' }] }));
    await TestBed.inject(Router).navigateByUrl(url);
    fixture = TestBed.createComponent(PairingPlanner);
    fixture.componentRef.setInput('rabbitryId', '7');
    el = fixture.nativeElement;
    TestBed.tick();
    backend.expectOne('/api/breeds').flush({ breeds: [] });
    const herd = backend.expectOne((r) => r.url === '/api/rabbitries/7/animals');
    expect(herd.request.params.get('status')).toBe('active');
    herd.flush({ rows: [], total: 0, page: 1, pageSize: 20 });
  }
  const pairingsRequest = () => backend.expectOne((r) => r.url === '/api/rabbitries/7/analytics/pairings');
  const rows = () => [...el.querySelectorAll('table.mates tr.mat-mdc-row')].map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.replace(/\s+/g, ' ').trim()));

  it('asks for nothing until an animal is chosen, and shows the cautions from the start', async () => {
    await open('/');
    await fixture.whenStable();
    backend.expectNone((r) => r.url.includes('/analytics/'));
    expect(el.querySelector('.kl-note h2')?.textContent).toBe('Choose a doe or a buck to begin');
    expect(el.querySelector('kl-cautions-note')?.textContent).toContain('smaller litters');
  });

  it('lists the mates with the litter’s inbreeding, breeding values and the ancestors behind it', async () => {
    await open('/?animal=108&trait=weight_16w');
    const request = pairingsRequest();
    expect(request.request.params.get('animal')).toBe('108');
    expect(request.request.params.get('trait')).toBe('weight_16w');
    request.flush(report);
    await fixture.whenStable();
    expect(el.querySelector('.summary')?.textContent?.replace(/\s+/g, ' ')).toContain('Planning for BF100 Lark (doe, Mini Rex, Ember line), breeding value −0.12 SD (accuracy 0.41) for weight at 12 weeks.');
    expect(rows()).toEqual([
      ['1', 'BF118Cobble II · Blue', '2.3 %less than first cousins', '+0.05 SD', '+0.23 SD', '0.54', 'Ember', '16 months', 'Distant (under 1/32)'],
      ['2', 'BF143Ivy II · Blue', '30.5 %as close as full sibs or parent × offspring', '+0.10 SD', '+0.32 SD', '—', 'Ember', '16 months',
        'BF056 Aster 46 %, an unrecorded ancestor 21 % High expected inbreeding: as close as a half-sib mating or closer.'],
    ]);
    expect(el.querySelector('kl-cautions-note')?.textContent).toContain(BREEDING_CAUTIONS[0]);
  });

  it('sorts the mates by a column the breeder chooses', async () => {
    await open('/?animal=108');
    pairingsRequest().flush(report);
    await fixture.whenStable();
    const header = [...el.querySelectorAll<HTMLElement>('table.mates th')].find((th) => th.textContent?.includes('Litter’s expected inbreeding'))!;
    header.querySelector<HTMLElement>('.mat-sort-header-container')!.click();
    header.querySelector<HTMLElement>('.mat-sort-header-container')!.click();
    await fixture.whenStable();
    expect(rows().map((r) => r[1])).toEqual(['BF143Ivy II · Blue', 'BF118Cobble II · Blue']);
  });

  it('draws the does × bucks heatmap and its table, and explains a cell when it is chosen', async () => {
    await open('/?animal=108');
    pairingsRequest().flush(report);
    await fixture.whenStable();
    const chart = fixture.debugElement.query(By.directive(PanelChart));
    const options = chart.componentInstance.options() as { series: { type: string; data: unknown[] }[] };
    expect(options.series[0]!.type).toBe('heatmap');
    expect(options.series[0]!.data).toHaveLength(4);
    expect([...el.querySelectorAll('.grid-table tbody tr')].map((tr) => tr.textContent?.replace(/\s+/g, ' ').trim())).toEqual([
      'BF100 Lark30.5 %2.3 %', 'BF132 Sorrel0 %12.5 %',
    ]);

    (chart.componentInstance as PanelChart).chartClick.emit({ data: { doe: sorrel, buck: ivy, value: [0, 1, 0] } } as never);
    TestBed.tick();
    const rel = backend.expectOne((r) => r.url === '/api/rabbitries/7/analytics/relationship');
    expect([rel.request.params.get('a'), rel.request.params.get('b')]).toEqual(['140', '151']);
    rel.flush({
      scope: report.scope, asOf: report.asOf, warnings: [], cautions: CAUTIONS,
      a: { animal: sorrel, f: 0 }, b: { animal: ivy, f: 0.1 }, additiveRelationship: 0, coefficientOfRelationship: 0,
      expectedOffspringInbreeding: 0, oppositeSexes: true, commonAncestors: [], otherAncestorsContribution: 0,
      explanation: 'BF132 and BF143 are unrelated on record (a = 0.000).',
    } satisfies RelationshipReport);
    await fixture.whenStable();
    const pair = el.querySelector('.pair')!;
    expect(pair.querySelector('h3')?.textContent).toBe('BF132 Sorrel × BF143 Ivy II');
    expect(pair.textContent).toContain('unrelated on record');
    expect([...pair.querySelectorAll('button')].map((b) => b.textContent?.trim())).toEqual(['Plan for BF132', 'Plan for BF143']);
  });

  it('saves the mates as CSV, formula-leading text escaped', async () => {
    await open('/?animal=108');
    pairingsRequest().flush({ ...report, candidates: [{ ...report.candidates[0]!, mate: { ...cobble, name: '=HYPERLINK("x")' } }] });
    await fixture.whenStable();
    let saved: Blob | null = null;
    const create = vi.spyOn(URL, 'createObjectURL').mockImplementation((b) => { saved = b as Blob; return 'blob:x'; });
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Download mates CSV')!.click();
    expect(create).toHaveBeenCalled();
    const bytes = new Uint8Array(await saved!.arrayBuffer());
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // the UTF-8 byte-order mark spreadsheets look for
    const text = await saved!.text();
    expect(text.split('\r\n')[0]).toBe('Rank,Mate ear ID,Mate name,Sex,Variety,Line,Age (days),Expected inbreeding F,Inbreeding band,Mate breeding value (SD),Mate breeding value accuracy (r),Expected litter breeding value (SD),Common ancestors (share of F),Notes');
    expect(text).toContain(`1,BF118,"'=HYPERLINK(""x"")",buck,Blue,Ember,494,0.02344,Under 6.25 %,0.233,0.537,0.054,,`);
  });

  it('says so when the pairings cannot be worked out, and tries again', async () => {
    await open('/?animal=108');
    pairingsRequest().flush({ error: { code: 'not-found', message: 'No animal 108 in this rabbitry.' } }, { status: 404, statusText: 'Not Found' });
    await fixture.whenStable();
    expect(el.querySelector('[role="alert"]')?.textContent).toContain('No animal 108 in this rabbitry.');
    [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Try again')!.click();
    TestBed.tick();
    pairingsRequest().flush(report);
    await fixture.whenStable();
    expect(rows()).toHaveLength(2);
  });
});
