import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';
import * as z from 'zod';
import { MeResponse, SignInRequest, UpdatePreferencesRequest } from '@shared/contracts/session';

export type PreferencesChange = z.input<typeof UpdatePreferencesRequest>;

/** Every call about the signed-in user: the session itself and the user's own preferences. */
@Injectable({ providedIn: 'root' })
export class SessionApi {
  private readonly http = inject(HttpClient);

  current(): Observable<MeResponse> {
    return this.http.get('/api/session').pipe(map((body) => MeResponse.parse(body)));
  }

  signIn(credentials: SignInRequest): Observable<MeResponse> {
    return this.http.post('/api/session', credentials).pipe(map((body) => MeResponse.parse(body)));
  }

  signOut(): Observable<void> {
    return this.http.delete<void>('/api/session');
  }

  updatePreferences(change: PreferencesChange): Observable<MeResponse> {
    return this.http.patch('/api/me/preferences', change).pipe(map((body) => MeResponse.parse(body)));
  }
}
