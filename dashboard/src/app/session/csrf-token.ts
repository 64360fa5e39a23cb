import { Injectable, signal } from '@angular/core';

/**
 * The session's anti-forgery token. Filled from GET /api/csrf, from MeResponse after sign-in
 * and from GET /api/session; cleared at sign-out because the API starts a new session then.
 */
@Injectable({ providedIn: 'root' })
export class CsrfToken {
  private readonly token = signal<string | null>(null);
  readonly value = this.token.asReadonly();

  set(token: string): void {
    this.token.set(token);
  }

  clear(): void {
    this.token.set(null);
  }
}
