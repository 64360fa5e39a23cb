import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { provideRouter } from '@angular/router';
import { of } from 'rxjs';
import { RabbitryMember } from '@shared/contracts/rabbitries';
import { ROLE_DESCRIPTIONS, RabbitryRole } from '@shared/contracts/roles';
import { CSRF_HEADER, csrfInterceptor } from '../session/csrf-interceptor';
import { signInAs, userWith } from '../session/test-users';
import { RabbitryAccess } from './rabbitry-access';

const members: RabbitryMember[] = [
  { userId: 1, displayName: 'Wren Tallow', email: 'wren@example.test', role: 'owner' },
  { userId: 12, displayName: 'Ivo Marsh', email: 'ivo@example.test', role: 'mentor' },
];

describe('RabbitryAccess', () => {
  let fixture: ComponentFixture<RabbitryAccess>;
  let backend: HttpTestingController;
  let page: HTMLElement;
  const confirmAnswer = { value: true };

  async function openAs(role: RabbitryRole) {
    TestBed.configureTestingModule({
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([csrfInterceptor])),
        provideHttpClientTesting(),
        { provide: MatDialog, useValue: { open: () => ({ afterClosed: () => of(confirmAnswer.value) }) } },
      ],
    });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role }] }), 'session-token');
    fixture = TestBed.createComponent(RabbitryAccess);
    fixture.componentRef.setInput('rabbitryId', '7');
    page = fixture.nativeElement;
    TestBed.tick();
    backend.expectOne('/api/rabbitries/7/members').flush({ members });
    await fixture.whenStable();
  }

  const buttons = (label: string) => [...page.querySelectorAll('button')].filter((b) => b.textContent?.trim() === label);
  const rows = () =>
    [...page.querySelectorAll('tr.mat-mdc-row')].map((row) => {
      const text = (selector: string) => row.querySelector(selector)?.textContent?.trim();
      return `${text('.kl-person-name')} <${text('.kl-person-detail')}> ${text('.kl-role')}`;
    });

  afterEach(() => backend.verify());

  it('lists everyone with access', async () => {
    await openAs('mentor');
    expect(rows()).toEqual(['Wren Tallow <wren@example.test> owner', 'Ivo Marsh <ivo@example.test> mentor']);
    expect(page.querySelector('tr.mat-mdc-row')?.textContent).toContain('(you)');
  });

  it.each(['partner', 'mentor'] as const)('shows a %s the list read-only, with what their role may do', async (role) => {
    await openAs(role);
    expect(page.querySelector('form')).toBeNull();
    expect(buttons('Revoke')).toEqual([]);
    expect(page.querySelector('.kl-note')?.textContent).toContain(ROLE_DESCRIPTIONS[role]);
    expect(page.querySelector('.kl-note')?.textContent).toContain('Only the owner grants or revokes access.');
  });

  it('gives the owner the grant form and a revoke button for everyone but the owner', async () => {
    await openAs('owner');
    expect(page.querySelector('form')).not.toBeNull();
    expect(buttons('Grant access')).toHaveLength(1);
    expect(buttons('Revoke').map((b) => b.getAttribute('aria-label'))).toEqual(['Revoke access for Ivo Marsh']);
    expect(page.querySelector('.kl-note')).toBeNull();
  });

  it('grants access and adds the person to the list', async () => {
    await openAs('owner');
    const email = page.querySelector<HTMLInputElement>('input[name="email"]')!;
    email.value = 'Juno@Example.test';
    email.dispatchEvent(new Event('input'));
    buttons('Grant access')[0].click();
    await fixture.whenStable();

    const request = backend.expectOne({ method: 'POST', url: '/api/rabbitries/7/members' });
    expect(request.request.body).toEqual({ email: 'juno@example.test', role: 'mentor' });
    expect(request.request.headers.get(CSRF_HEADER)).toBe('session-token');
    request.flush({ userId: 15, displayName: 'Juno Reed', email: 'juno@example.test', role: 'mentor' });
    await fixture.whenStable();

    expect(rows()[2]).toBe('Juno Reed <juno@example.test> mentor');
    expect(email.value).toBe('');
  });

  it('shows the API’s reason when a grant is refused', async () => {
    await openAs('owner');
    const email = page.querySelector<HTMLInputElement>('input[name="email"]')!;
    email.value = 'nobody@example.test';
    email.dispatchEvent(new Event('input'));
    buttons('Grant access')[0].click();
    await fixture.whenStable();
    backend
      .expectOne({ method: 'POST', url: '/api/rabbitries/7/members' })
      .flush({ error: { code: 'not-found', message: 'No account uses nobody@example.test.' } }, { status: 404, statusText: 'Not Found' });
    await fixture.whenStable();
    expect(page.querySelector('.kl-form-failure')?.textContent).toContain('No account uses nobody@example.test.');
    expect(rows()).toHaveLength(2);
  });

  it('revokes only after the owner confirms', async () => {
    await openAs('owner');
    confirmAnswer.value = false;
    buttons('Revoke')[0].click();
    await fixture.whenStable();
    backend.expectNone({ method: 'DELETE', url: '/api/rabbitries/7/members/12' });

    confirmAnswer.value = true;
    buttons('Revoke')[0].click();
    await fixture.whenStable();
    backend.expectOne({ method: 'DELETE', url: '/api/rabbitries/7/members/12' }).flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    expect(rows()).toEqual(['Wren Tallow <wren@example.test> owner']);
  });
});
