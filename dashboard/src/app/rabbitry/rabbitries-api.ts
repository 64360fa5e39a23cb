import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';
import * as z from 'zod';
import { GrantRabbitryAccessRequest, Rabbitry, RabbitryMember } from '@shared/contracts/rabbitries';

const RabbitryList = z.object({ rabbitries: z.array(Rabbitry) });
const RabbitryMemberList = z.object({ members: z.array(RabbitryMember) });
export type GrantAccess = z.input<typeof GrantRabbitryAccessRequest>;

const base = (rabbitryId: string) => `/api/rabbitries/${encodeURIComponent(rabbitryId)}`;

/** Every call about rabbitries. Reads are resources, created in the calling component's context. */
@Injectable({ providedIn: 'root' })
export class RabbitriesApi {
  private readonly http = inject(HttpClient);

  list() {
    return httpResource(() => '/api/rabbitries', { parse: (body) => RabbitryList.parse(body).rabbitries });
  }

  one(rabbitryId: () => string) {
    return httpResource(() => base(rabbitryId()), { parse: (body) => Rabbitry.parse(body) });
  }

  members(rabbitryId: () => string) {
    return httpResource(() => `${base(rabbitryId())}/members`, {
      parse: (body) => RabbitryMemberList.parse(body).members,
    });
  }

  grant(rabbitryId: string, request: GrantAccess): Observable<RabbitryMember> {
    return this.http.post(`${base(rabbitryId)}/members`, request).pipe(map((body) => RabbitryMember.parse(body)));
  }

  revoke(rabbitryId: string, userId: number): Observable<void> {
    return this.http.delete<void>(`${base(rabbitryId)}/members/${userId}`);
  }
}
