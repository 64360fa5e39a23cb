import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { sessionExpiryInterceptor } from './session-expiry-interceptor';
import { signInAs, userWith } from './test-users';

describe('sessionExpiryInterceptor', () => {
  const expired = { error: { code: 'unauthenticated', message: 'Sign in again.' } };

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideRouter([]), provideHttpClient(withInterceptors([sessionExpiryInterceptor])), provideHttpClientTesting()],
    });
  });

  it('forgets the user and sends them to sign in when a call answers 401', async () => {
    const session = await signInAs(userWith());
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    const failed = vi.fn();
    TestBed.inject(HttpClient).get('/api/rabbitries').subscribe({ error: failed });
    TestBed.inject(HttpTestingController).expectOne('/api/rabbitries').flush(expired, { status: 401, statusText: 'Unauthorized' });

    expect(session.user()).toBeNull();
    expect(navigate).toHaveBeenCalledWith(['/sign-in'], { queryParams: { returnUrl: '/' } });
    expect(failed).toHaveBeenCalled();
  });

  it('leaves the session calls’ own 401 answers to their callers', async () => {
    const session = await signInAs(userWith());
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate');
    TestBed.inject(HttpClient).post('/api/session', {}).subscribe({ error: () => undefined });
    TestBed.inject(HttpTestingController).expectOne('/api/session').flush(expired, { status: 401, statusText: 'Unauthorized' });

    expect(session.user()).not.toBeNull();
    expect(navigate).not.toHaveBeenCalled();
  });
});
