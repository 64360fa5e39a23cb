import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { AnimalProfile as Profile, PedigreeTreeNode } from '@shared/contracts/animals';
import { DEFAULT_EVALUATION_TRAITS } from '@shared/domain/breed';
import type { RabbitryRole } from '@shared/contracts/roles';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { signInAs, userWith } from '../session/test-users';
import { AnimalProfile } from './animal-profile';

const summary = (id: number, earId: string, sex: 'buck' | 'doe') => ({ id, earId, name: null, sex, variety: 'Castor', birthDate: null, status: 'active' as const, isStub: false });
const node = (id: number, earId: string, sex: 'buck' | 'doe', more: Partial<PedigreeTreeNode> = {}): PedigreeTreeNode => ({
  id, earId, name: null, sex, variety: 'Castor', weightGrams: 2000, registrationNo: null, grandChampion: false, breeder: null, isStub: false, ...more,
});
const profile: Profile = {
  animal: {
    id: 5, rabbitryId: 7, earId: 'BF101', name: 'Sorrel', sex: 'doe', variety: 'Castor', birthDate: '2025-05-15', status: 'active', isStub: false,
    breedId: 2, breed: 'Mini Rex', sireId: 3, damId: 4, litterId: null, line: 'Ember', registrationNo: null, grandChampion: false, breeder: null,
    stubWeightGrams: null, hasPhoto: false, notes: null, keeperDecision: 'keep',
  },
  ageDays: 560, ageClass: 'senior', sire: summary(3, 'BF040', 'buck'), dam: summary(4, 'BF041', 'doe'),
  weights: [{ id: 1, weighedOn: '2026-11-20', grams: 2100, display: '4 lb 10 oz', notes: null }],
  evaluations: [],
  statusHistory: [{ id: 1, status: 'sold', changedOn: '2026-02-01', note: 'to a junior member' }, { id: 2, status: 'active', changedOn: '2026-03-01', note: 'bought back' }],
  showRecord: {
    results: [{ resultId: 9, showId: 2, showName: 'Quill Winter Show', showDate: '2026-01-17', judge: 'R. Ambleforth', breed: 'Mini Rex', variety: 'Castor', sex: 'doe',
      ageClass: 'senior', entriesInClass: 7, exhibitorsInClass: 4, placing: 1, awards: ['BOV'], computedAgeClass: 'senior', ageClassMismatch: false }],
    legs: [{ showId: '2', showDate: '2026-01-17', judge: 'R. Ambleforth', ageClass: 'senior', basis: 'BOV', entries: 12, exhibitors: 5 }],
    grandChampion: { recorded: false, earned: false, completedOn: null, missing: ['2 more legs'] },
  },
  offspring: [summary(11, 'BF150', 'buck')],
  litters: {
    asSire: [],
    asDam: [{ id: 21, code: 'BF-2601', mate: { id: 3, earId: 'BF040', name: 'Rook' }, bredOn: '2026-06-01', kindledOn: '2026-07-02',
      bornAlive: 5, bornDead: 1, weaned: 5, kitsRecorded: 1 }],
  },
  notes: [{ id: 1, authorName: 'Ivo Marsh', body: 'Strong shoulders.', createdAt: '2026-11-01T10:00:00.000Z' }],
  registration: { ready: false, missing: ["dam's sire: no weight recorded"], caution: 'A check of the records only.' },
  weightCheck: {
    grams: 2100, weighedOn: '2026-11-20', ageClass: 'senior', limits: { minGrams: 1474, idealGrams: 1928, maxGrams: 2041 },
    status: 'over-maximum', disqualificationRisk: true, gramsFromIdeal: 172, caution: 'The judge decides on the day.',
  },
};
const tree = node(5, 'BF101', 'doe', { sire: node(3, 'BF040', 'buck', { sire: node(1, 'WH14', 'buck', { isStub: true, breeder: 'Wraybeck' }), dam: null }), dam: node(4, 'BF041', 'doe') });

describe('AnimalProfile', () => {
  let fixture: ComponentFixture<AnimalProfile>;
  let backend: HttpTestingController;
  let el: HTMLElement;

  async function openAs(role: RabbitryRole) {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting(), validateAsYouType] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role }] }));
    fixture = TestBed.createComponent(AnimalProfile);
    fixture.componentRef.setInput('rabbitryId', '7');
    fixture.componentRef.setInput('animalId', '5');
    el = fixture.nativeElement;
    TestBed.tick();
    backend.expectOne('/api/rabbitries/7/animals/5').flush(profile);
    backend.expectOne((r) => r.url === '/api/rabbitries/7/animals/5/pedigree' && r.params.get('generations') === '4').flush({ generations: 4, tree });
    backend.expectOne('/api/rabbitries/7/animals/5/evaluations').flush({ traits: DEFAULT_EVALUATION_TRAITS, evaluations: [] });
    backend.expectOne('/api/breeds').flush({ breeds: [] });
    await fixture.whenStable();
  }
  const text = () => el.textContent?.replace(/\s+/g, ' ') ?? '';
  const section = (title: string) => [...el.querySelectorAll('section.card')].find((s) => s.querySelector('h2')?.textContent === title)!;

  afterEach(() => backend.verify());

  it('shows the key facts, parents and the certificate download', async () => {
    await openAs('owner');
    expect(el.querySelector('h1')?.textContent?.replace(/\s+/g, ' ').trim()).toBe('BF101 Sorrel');
    expect(el.querySelector('.facts')?.textContent).toMatch(/^Doe · Mini Rex · Castor · born 2025-05-15 \(\d+ (months|years?)/);
    expect(el.querySelector('.facts')?.textContent).toContain('senior today · line Ember');
    expect(el.querySelector('.parents')?.textContent?.replace(/\s+/g, ' ')).toContain('Sire: BF040 · Dam: BF041');
    expect(el.querySelector<HTMLAnchorElement>('a[download]')?.getAttribute('href')).toBe('/api/rabbitries/7/animals/5/pedigree.pdf?paper=letter');
    expect([...el.querySelectorAll('.badge')].map((b) => b.textContent?.trim())).toEqual(['Active', 'Keeper']);
  });

  it('flags a weight over the breed maximum, with the caution', async () => {
    await openAs('owner');
    const flag = el.querySelector('.flag.risk');
    expect(flag?.getAttribute('role')).toBe('alert');
    expect(flag?.textContent).toContain('is over the maximum of 4 lb 8 oz: disqualification risk.');
    expect(flag?.textContent).toContain('check them against the current official standard');
  });

  it('draws the pedigree with outside parents marked and each ancestor linked', async () => {
    await openAs('mentor');
    const slots = [...el.querySelectorAll('kl-pedigree-tree li')];
    expect(slots).toHaveLength(30);
    const stub = slots.find((s) => s.classList.contains('stub'))!;
    expect(stub.textContent).toContain('Sire’s sire');
    expect(stub.textContent).toContain('Outside parent · bred by Wraybeck');
    expect(stub.querySelector('a')?.getAttribute('href')).toBe('/r/7/animals/1');
    expect(slots.filter((s) => s.classList.contains('empty'))).toHaveLength(30 - 3);
  });

  it('lists the show record, registration gaps, status history, offspring and litters', async () => {
    await openAs('owner');
    expect(section('Show record').textContent).toContain('1 leg toward grand champion.');
    expect(section('Show record').querySelector('td')?.textContent).toContain('2026-01-17');
    expect(section('Show record').textContent).toContain('1st of 7');
    expect(section('Registration readiness').textContent).toContain("dam's sire: no weight recorded");
    expect(section('Status').textContent?.replace(/\s+/g, ' ')).toContain('Sold on 2026-02-01 — to a junior member');
    const family = section('Offspring and litters');
    expect(family.querySelector('.litters li')?.textContent?.replace(/\s+/g, ' ').trim())
      .toBe('BF-2601 by BF040 Rook bred 2026-06-01, kindled 2026-07-02 · 5 born alive, 1 dead · 5 weaned · 1 kit recorded');
    expect(family.querySelector('.litters li a:nth-of-type(2)')?.getAttribute('href')).toBe('/r/7/animals/3');
    expect(section('Evaluations').textContent).toContain('7 traits worth 100 points');
  });

  it('gives a mentor notes but no editing', async () => {
    await openAs('mentor');
    expect(text()).not.toContain('Edit details');
    expect(text()).not.toContain('Add weighing');
    expect(text()).not.toContain('Keeper decision');
    expect(text()).not.toContain('Record status');
    expect(section('Notes').querySelector('button')?.textContent?.trim()).toBe('Add note');
    expect(section('Notes').textContent).toContain('Strong shoulders.');
  });

  it('reads a weight as it is typed and shows the parser’s message', async () => {
    await openAs('owner');
    const weight = el.querySelector<HTMLInputElement>('input[name="weight"]')!;
    weight.value = '5.2';
    weight.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(section('Weights').querySelector('mat-error')?.textContent).toContain('"5.2" has no unit');
    weight.value = '5-12';
    weight.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(section('Weights').querySelector('mat-hint')?.textContent).toBe('= 5 lb 12 oz (2608 g)');

    section('Weights').querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    TestBed.tick();
    const post = backend.expectOne({ method: 'POST', url: '/api/rabbitries/7/animals/5/weights' });
    expect(post.request.body).toMatchObject({ weight: '5-12', notes: null });
    post.flush({ id: 2, weighedOn: post.request.body.weighedOn, grams: 2608, display: '5 lb 12 oz', notes: null });
    TestBed.tick();
    backend.expectOne('/api/rabbitries/7/animals/5').flush(profile);
    backend.expectOne('/api/rabbitries/7/animals/5/evaluations').flush({ traits: DEFAULT_EVALUATION_TRAITS, evaluations: [] });
    backend.expectOne((r) => r.url.endsWith('/pedigree')).flush({ generations: 4, tree });
    await fixture.whenStable();
  });
});
