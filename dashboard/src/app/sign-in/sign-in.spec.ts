import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { CSRF_HEADER, csrfInterceptor } from '../session/csrf-interceptor';
import { Session } from '../session/session';
import { userWith } from '../session/test-users';
import { SignIn } from './sign-in';

describe('SignIn', () => {
  let fixture: ComponentFixture<SignIn>;
  let backend: HttpTestingController;
  let page: HTMLElement;

  const field = (name: string) => page.querySelector<HTMLInputElement>(`input[name="${name}"]`)!;
  const errors = () => [...page.querySelectorAll('mat-error')].map((e) => e.textContent?.trim());
  const alertText = () => page.querySelector('[role="alert"]')?.textContent?.trim() ?? '';

  async function type(name: string, value: string) {
    const input = field(name);
    input.value = value;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  }

  async function submit() {
    page.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  }

  /** Fills the form, submits, and answers the token fetch the first write needs. */
  async function submitCredentials() {
    await type('email', '  Wren@Example.test ');
    await type('password', 'hutch-card-42');
    await submit();
    backend.expectOne({ method: 'GET', url: '/api/csrf' }).flush({ csrfToken: 'pre-session' });
    return backend.expectOne({ method: 'POST', url: '/api/session' });
  }

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([csrfInterceptor])), provideHttpClientTesting()],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(SignIn);
    fixture.componentRef.setInput('returnUrl', '/r/7/access');
    page = fixture.nativeElement;
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  it('names the product and labels both fields', () => {
    expect(page.textContent).toContain('Keeperline');
    const labels = [...page.querySelectorAll('mat-label')].map((l) => l.textContent?.trim());
    expect(labels).toEqual(['E-mail', 'Password']);
  });

  it('checks the e-mail while it is typed, with the contract’s wording', async () => {
    await type('email', 'wren@');
    expect(errors()).toEqual(['Enter the e-mail address of your account']);
    await type('email', 'wren@example.test');
    expect(errors()).toEqual([]);
  });

  it('sends nothing while the form is incomplete, and says what is missing', async () => {
    await submit();
    expect(errors()).toEqual(['Enter the e-mail address of your account', 'Enter your password']);
    backend.expectNone('/api/session');
    backend.expectNone('/api/csrf');
  });

  it('shows the API’s message for a wrong password and selects the password for retyping', async () => {
    const request = await submitCredentials();
    expect(request.request.body).toEqual({ email: 'wren@example.test', password: 'hutch-card-42' });
    expect(request.request.headers.get(CSRF_HEADER)).toBe('pre-session');
    request.flush(
      { error: { code: 'bad-credentials', message: 'That e-mail and password do not match an account.' } },
      { status: 401, statusText: 'Unauthorized' },
    );
    await fixture.whenStable();

    expect(alertText()).toBe('That e-mail and password do not match an account.');
    expect(document.activeElement).toBe(field('password'));
    expect([field('password').selectionStart, field('password').selectionEnd]).toEqual([0, 'hutch-card-42'.length]);
    expect(errors()).toEqual([]);
    expect(TestBed.inject(Session).user()).toBeNull();
  });

  it('shows the API’s message when there were too many attempts', async () => {
    (await submitCredentials()).flush(
      { error: { code: 'rate-limited', message: 'Too many attempts. Wait 15 minutes, then try again.' } },
      { status: 429, statusText: 'Too Many Requests' },
    );
    await fixture.whenStable();
    expect(alertText()).toBe('Too many attempts. Wait 15 minutes, then try again.');
  });

  it('puts the API’s field messages on the fields', async () => {
    (await submitCredentials()).flush(
      { error: { code: 'validation', message: 'Check the form.', details: { email: 'No account uses this address.' } } },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    expect(errors()).toEqual(['No account uses this address.']);
  });

  it('signs in and goes back to where the breeder was headed', async () => {
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    (await submitCredentials()).flush({ user: userWith(), csrfToken: 'after-sign-in' });
    await fixture.whenStable();
    expect(navigate).toHaveBeenCalledWith('/r/7/access');
    expect(TestBed.inject(Session).user()?.email).toBe('wren@example.test');
  });
});
