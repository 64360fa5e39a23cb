import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { GrantRabbitryAccessRequest, type RabbitryMember } from '@shared/contracts/rabbitries';
import { RABBITRY_ROLES } from '@shared/contracts/roles';
import { MemberList, type MemberListPlace } from '../members/member-list';
import { Session } from '../session/session';
import { RabbitriesApi } from './rabbitries-api';

/** Who may open a rabbitry's records: only the owner grants and revokes access. */
@Component({
  selector: 'kl-rabbitry-access',
  template: `<kl-member-list [title]="title()" [place]="place" [people]="members" [myRole]="membership()?.role ?? null" [canManage]="canManage()" />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MemberList],
})
export class RabbitryAccess {
  private readonly api = inject(RabbitriesApi);
  private readonly session = inject(Session);

  readonly rabbitryId = input.required<string>();

  protected readonly membership = computed(() => this.session.user()?.rabbitries.find((r) => String(r.id) === this.rabbitryId()) ?? null);
  protected readonly canManage = computed(() => this.membership()?.role === 'owner');
  protected readonly title = computed(() => `Access to ${this.membership()?.name ?? ''}`);
  protected readonly members = this.api.members(this.rabbitryId);

  protected readonly place: MemberListPlace<RabbitryMember> = {
    lede: 'Everyone listed here can open this rabbitry’s records, each as far as their role allows.',
    listHeading: 'Who has access',
    personHeading: 'Person',
    loadingLabel: 'Loading who has access',
    loadFailure: 'The list of people with access could not be loaded.',
    emptyList: 'No one has access yet.',
    whoManages: 'Only the owner grants or revokes access.',
    roles: RABBITRY_ROLES,
    add: {
      heading: 'Grant access',
      intro: 'The person needs a Keeperline account with this e-mail address.',
      submitLabel: 'Grant access',
      schema: GrantRabbitryAccessRequest,
      roles: [{ value: 'mentor', label: 'Mentor', hint: 'Reads and leaves notes' }, { value: 'partner', label: 'Partner', hint: 'Edits records' }],
      exhibitorName: false,
      request: (person) => this.api.grant(this.rabbitryId(), GrantRabbitryAccessRequest.parse(person)),
      done: (m) => `${m.displayName} now has ${m.role} access.`,
    },
    remove: {
      label: 'Revoke',
      ariaLabel: (m) => `Revoke access for ${m.displayName}`,
      allowed: (m) => m.role !== 'owner',
      confirmation: (m) => ({
        title: `Revoke access for ${m.displayName}?`,
        message: `${m.displayName} (${m.email}) will no longer see this rabbitry. You can grant access again later.`,
        confirmLabel: 'Revoke access',
      }),
      request: (m) => this.api.revoke(this.rabbitryId(), m.userId),
      done: (m) => `${m.displayName} no longer has access.`,
    },
  };
}
