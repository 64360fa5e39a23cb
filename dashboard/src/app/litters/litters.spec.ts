import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { Litter } from '@shared/contracts/litters';
import type { RabbitryRole } from '@shared/contracts/roles';
import { kindlingWindow } from '@shared/domain/gestation';
import { signInAs, userWith } from '../session/test-users';
import { Litters } from './litters';

const litter = (id: number, code: string, over: Partial<Litter> = {}): Litter => ({
  id, code, sireId: 1, sireEarId: 'BF002', damId: 2, damEarId: 'BF004', bredOn: '2022-02-16', kindledOn: '2022-03-22',
  kindlingWindow: kindlingWindow('2022-02-16'), bornAlive: 5, bornDead: 0, weaned: 5, weight21dGrams: 1134, kitsRecorded: 5, notes: null, ...over,
});

describe('Litters', () => {
  let fixture: ComponentFixture<Litters>;
  let backend: HttpTestingController;
  let el: HTMLElement;

  async function openAs(role: RabbitryRole, litters: Litter[]) {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role }] }));
    fixture = TestBed.createComponent(Litters);
    fixture.componentRef.setInput('rabbitryId', '7');
    el = fixture.nativeElement;
    TestBed.tick();
    backend.expectOne('/api/rabbitries/7/litters').flush({ litters, caution: 'Gestation usually runs 31–32 days (29–35).' });
    await fixture.whenStable();
  }
  afterEach(() => backend.verify());

  it('shows each litter with its kindling window, counts and 21-day weight in the user’s unit', async () => {
    // Bred 2022-02-16 + 31/32 days (common practice) = 2022-03-19 to 2022-03-20.
    await openAs('owner', [litter(1, 'BF-2202')]);
    const cells = [...el.querySelectorAll('tr.mat-mdc-row td')].map((td) => td.textContent?.replace(/\s+/g, ' ').trim());
    expect(cells.slice(0, 6)).toEqual(['BF-2202 BF002 × BF004', '2022-02-16 expected 2022-03-19 – 03-20', '2022-03-22 5 alive · 0 dead', '5', '2 lb 8 oz', '5']);
    expect(el.querySelector('a[download]')?.getAttribute('href')).toBe('/api/rabbitries/7/litters?format=csv');
    expect(el.querySelector('.caution')?.textContent).toContain('A veterinarian answers health questions');
    expect(el.querySelector('.caution')?.textContent).toContain('Gestation usually runs 31–32 days (29–35).');
  });

  it('tells a doe due now and offers kits only for a kindled litter', async () => {
    const today = new Date();
    const bred = new Date(today.getFullYear(), today.getMonth(), today.getDate() - 30);
    const iso = `${bred.getFullYear()}-${String(bred.getMonth() + 1).padStart(2, '0')}-${String(bred.getDate()).padStart(2, '0')}`;
    await openAs('partner', [litter(2, 'BF-2699', { bredOn: iso, kindlingWindow: kindlingWindow(iso), kindledOn: null, bornAlive: null, kitsRecorded: 0 })]);
    expect(el.querySelector('.state')?.textContent?.trim()).toBe('due now');
    const labels = [...el.querySelectorAll('td button')].map((b) => b.textContent?.trim());
    expect(labels).toEqual(['Edit']);
  });

  it('shows an empty rabbitry how to start, and a mentor no edits', async () => {
    await openAs('mentor', []);
    expect(el.querySelector('.empty h2')?.textContent).toBe('No litters yet');
    expect([...el.querySelectorAll('button')].map((b) => b.textContent?.trim())).not.toContain('Record a breeding');
  });
});
