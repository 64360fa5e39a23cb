import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';
import * as z from 'zod';
import { AddClubMemberRequest, Club, ClubMember } from '@shared/contracts/clubs';

const ClubList = z.object({ clubs: z.array(Club) });
const ClubMemberList = z.object({ members: z.array(ClubMember) });
export type AddClubMember = z.input<typeof AddClubMemberRequest>;

const base = (clubId: string) => `/api/clubs/${encodeURIComponent(clubId)}`;

/** Every call about clubs. Reads are resources, created in the calling component's context. */
@Injectable({ providedIn: 'root' })
export class ClubsApi {
  private readonly http = inject(HttpClient);

  list() {
    return httpResource(() => '/api/clubs', { parse: (body) => ClubList.parse(body).clubs });
  }

  one(clubId: () => string) {
    return httpResource(() => base(clubId()), { parse: (body) => Club.parse(body) });
  }

  members(clubId: () => string) {
    return httpResource(() => `${base(clubId())}/members`, { parse: (body) => ClubMemberList.parse(body).members });
  }

  addMember(clubId: string, request: AddClubMember): Observable<ClubMember> {
    return this.http.post(`${base(clubId)}/members`, request).pipe(map((body) => ClubMember.parse(body)));
  }

  removeMember(clubId: string, userId: number): Observable<void> {
    return this.http.delete<void>(`${base(clubId)}/members/${userId}`);
  }
}
