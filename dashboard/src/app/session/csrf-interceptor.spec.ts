import { HttpClient, HttpErrorResponse, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom } from 'rxjs';
import { CSRF_HEADER, csrfInterceptor } from './csrf-interceptor';
import { CsrfToken } from './csrf-token';

describe('csrfInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let token: CsrfToken;
  const csrfRejection = { error: { code: 'csrf', message: 'The form expired; reload and try again.' } };

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([csrfInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
    token = TestBed.inject(CsrfToken);
  });

  afterEach(() => backend.verify());

  it('leaves reads alone', () => {
    token.set('held');
    http.get('/api/rabbitries').subscribe();
    expect(backend.expectOne('/api/rabbitries').request.headers.has(CSRF_HEADER)).toBe(false);
  });

  it('adds the held token to a write', () => {
    token.set('held');
    http.post('/api/rabbitries', { name: 'Brackenrow' }).subscribe();
    expect(backend.expectOne('/api/rabbitries').request.headers.get(CSRF_HEADER)).toBe('held');
  });

  it('fetches a token first when none is held, and keeps it', () => {
    http.delete('/api/session').subscribe();
    backend.expectOne({ method: 'GET', url: '/api/csrf' }).flush({ csrfToken: 'fresh-1' });
    expect(backend.expectOne({ method: 'DELETE', url: '/api/session' }).request.headers.get(CSRF_HEADER)).toBe('fresh-1');
    expect(token.value()).toBe('fresh-1');
  });

  it('never sends the token to another site', () => {
    token.set('held');
    http.post('https://elsewhere.example/api/x', {}).subscribe();
    expect(backend.expectOne('https://elsewhere.example/api/x').request.headers.has(CSRF_HEADER)).toBe(false);
  });

  it('refetches the token and retries once when the API rejects it', async () => {
    token.set('stale');
    const answer = firstValueFrom(http.patch('/api/me/preferences', { weightUnit: 'kg' }));
    const first = backend.expectOne({ method: 'PATCH', url: '/api/me/preferences' });
    expect(first.request.headers.get(CSRF_HEADER)).toBe('stale');
    first.flush(csrfRejection, { status: 403, statusText: 'Forbidden' });

    backend.expectOne({ method: 'GET', url: '/api/csrf' }).flush({ csrfToken: 'renewed' });
    const retry = backend.expectOne({ method: 'PATCH', url: '/api/me/preferences' });
    expect(retry.request.headers.get(CSRF_HEADER)).toBe('renewed');
    expect(retry.request.body).toEqual({ weightUnit: 'kg' });
    retry.flush({ ok: true });

    await expect(answer).resolves.toEqual({ ok: true });
    expect(token.value()).toBe('renewed');
  });

  it('gives up after one retry and hands the second rejection to the caller', async () => {
    token.set('stale');
    const answer = firstValueFrom(http.post('/api/rabbitries', { name: 'Brackenrow' }));
    backend.expectOne({ method: 'POST', url: '/api/rabbitries' }).flush(csrfRejection, { status: 403, statusText: 'Forbidden' });
    backend.expectOne('/api/csrf').flush({ csrfToken: 'renewed' });
    backend.expectOne({ method: 'POST', url: '/api/rabbitries' }).flush(csrfRejection, { status: 403, statusText: 'Forbidden' });

    const err = await answer.catch((e: unknown) => e);
    expect(err).toBeInstanceOf(HttpErrorResponse);
    expect((err as HttpErrorResponse).status).toBe(403);
    backend.expectNone('/api/csrf');
  });

  it('does not retry a 403 that is about permissions', async () => {
    token.set('held');
    const answer = firstValueFrom(http.delete('/api/rabbitries/7'));
    backend
      .expectOne('/api/rabbitries/7')
      .flush({ error: { code: 'forbidden', message: 'Only the owner may delete the rabbitry.' } }, { status: 403, statusText: 'Forbidden' });
    await expect(answer).rejects.toBeInstanceOf(HttpErrorResponse);
    backend.expectNone('/api/csrf');
  });
});
