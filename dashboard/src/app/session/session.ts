import { HttpErrorResponse } from '@angular/common/http';
import { Injectable, computed, inject, signal } from '@angular/core';
import { Observable, firstValueFrom, map, tap } from 'rxjs';
import { CurrentUser, MeResponse, SignInRequest } from '@shared/contracts/session';
import { CsrfToken } from './csrf-token';
import { PreferencesChange, SessionApi } from './session-api';

/** The signed-in user, held once for the whole app; screens read `user()`. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly api = inject(SessionApi);
  private readonly csrf = inject(CsrfToken);
  private readonly current = signal<CurrentUser | null>(null);
  private restoring: Promise<CurrentUser | null> | null = null;

  readonly user = this.current.asReadonly();
  readonly signedIn = computed(() => this.current() !== null);

  /**
   * Asks the API once per page load who is signed in. Resolves null when it answers 401;
   * rejects on any other failure so the caller can tell "signed out" from "unreachable".
   */
  restore(): Promise<CurrentUser | null> {
    const known = this.current();
    if (known) return Promise.resolve(known);
    this.restoring ??= this.ask();
    return this.restoring;
  }

  /**
   * Asks the API again, e.g. after someone granted this user access to a rabbitry or club.
   * The known user stays in place until the answer arrives.
   */
  refresh(): Promise<CurrentUser | null> {
    this.restoring = this.ask();
    return this.restoring;
  }

  signIn(credentials: SignInRequest): Observable<CurrentUser> {
    return this.api.signIn(credentials).pipe(map((me) => this.accept(me)));
  }

  signOut(): Observable<void> {
    return this.api.signOut().pipe(tap(() => this.forget()));
  }

  updatePreferences(change: PreferencesChange): Observable<CurrentUser> {
    return this.api.updatePreferences(change).pipe(map((me) => this.accept(me)));
  }

  /** The API no longer knows this session (it expired or was ended elsewhere). */
  forget(): void {
    this.current.set(null);
    this.csrf.clear();
    this.restoring = Promise.resolve(null);
  }

  private ask(): Promise<CurrentUser | null> {
    return firstValueFrom(this.api.current()).then(
      (me) => this.accept(me),
      (err: unknown) => {
        if (err instanceof HttpErrorResponse && err.status === 401) {
          this.forget();
          return null;
        }
        this.restoring = null; // a later navigation may try again
        throw err;
      },
    );
  }

  private accept(me: MeResponse): CurrentUser {
    this.csrf.set(me.csrfToken);
    this.current.set(me.user);
    this.restoring = Promise.resolve(me.user);
    return me.user;
  }
}
