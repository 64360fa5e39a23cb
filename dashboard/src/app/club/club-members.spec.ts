import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { ClubMember } from '@shared/contracts/clubs';
import { ClubRole } from '@shared/contracts/roles';
import { signInAs, userWith } from '../session/test-users';
import { ClubMembers } from './club-members';

const members: ClubMember[] = [
  { userId: 1, displayName: 'Wren Tallow', email: 'wren@example.test', role: 'officer', exhibitorName: null },
  { userId: 21, displayName: 'Tamsin Oakes', email: 'tamsin@example.test', role: 'member', exhibitorName: 'Oakes Hollow' },
];

async function openAs(role: ClubRole) {
  TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
  const backend = TestBed.inject(HttpTestingController);
  await signInAs(userWith({ clubs: [{ id: 3, name: 'Saltmeadow Fanciers', role }] }));
  const fixture = TestBed.createComponent(ClubMembers);
  fixture.componentRef.setInput('clubId', '3');
  TestBed.tick();
  backend.expectOne('/api/clubs/3/members').flush({ members });
  await fixture.whenStable();
  return { page: fixture.nativeElement as HTMLElement, backend, fixture };
}

describe('ClubMembers', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('lets an officer add members and remove anyone but themselves', async () => {
    const { page } = await openAs('officer');
    expect(page.querySelector('form')).not.toBeNull();
    const removals = [...page.querySelectorAll('button')].filter((b) => b.textContent?.trim() === 'Remove');
    expect(removals.map((b) => b.getAttribute('aria-label'))).toEqual(['Remove Tamsin Oakes from the club']);
    expect(page.textContent).toContain('Exhibits as Oakes Hollow');
  });

  it('shows a member the list without any way to change it', async () => {
    const { page } = await openAs('member');
    expect(page.querySelector('form')).toBeNull();
    expect(page.textContent).not.toContain('Remove');
    expect(page.querySelector('.kl-note')?.textContent).toContain('Club officers add and remove members.');
  });

  it('sends an empty exhibitor name as null', async () => {
    const { page, backend, fixture } = await openAs('officer');
    const email = page.querySelector<HTMLInputElement>('input[name="email"]')!;
    email.value = 'pell@example.test';
    email.dispatchEvent(new Event('input'));
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
    const request = backend.expectOne({ method: 'POST', url: '/api/clubs/3/members' });
    expect(request.request.body).toEqual({ email: 'pell@example.test', role: 'member', exhibitorName: null });
    request.flush({ userId: 30, displayName: 'Pell Ashdown', email: 'pell@example.test', role: 'member', exhibitorName: null });
  });
});
