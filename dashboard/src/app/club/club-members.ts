import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { AddClubMemberRequest, type ClubMember } from '@shared/contracts/clubs';
import { CLUB_ROLES } from '@shared/contracts/roles';
import { MemberList, type MemberListPlace } from '../members/member-list';
import { Session } from '../session/session';
import { ClubsApi } from './clubs-api';

/** A club's members: officers add and remove them; every member reads the list. */
@Component({
  selector: 'kl-club-members',
  template: `<kl-member-list [title]="title()" [place]="place" [people]="members" [myRole]="membership()?.role ?? null" [canManage]="canManage()" />`,
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MemberList],
})
export class ClubMembers {
  private readonly api = inject(ClubsApi);
  private readonly session = inject(Session);

  readonly clubId = input.required<string>();

  protected readonly membership = computed(() => this.session.user()?.clubs.find((c) => String(c.id) === this.clubId()) ?? null);
  protected readonly canManage = computed(() => this.membership()?.role === 'officer');
  protected readonly title = computed(() => `Members of ${this.membership()?.name ?? ''}`);
  protected readonly members = this.api.members(this.clubId);

  protected readonly place: MemberListPlace<ClubMember> = {
    lede: 'Members read the club’s season results and see their own placements; officers run the season.',
    listHeading: 'Members',
    personHeading: 'Member',
    loadingLabel: 'Loading the members',
    loadFailure: 'The member list could not be loaded.',
    emptyList: 'The club has no members yet.',
    whoManages: 'Club officers add and remove members.',
    roles: CLUB_ROLES,
    add: {
      heading: 'Add a member',
      intro: 'The person needs a Keeperline account with this e-mail address. The exhibitor name is how they appear in show results, so imported results can be matched to them.',
      submitLabel: 'Add member',
      schema: AddClubMemberRequest,
      roles: [{ value: 'member', label: 'Member' }, { value: 'officer', label: 'Officer' }],
      exhibitorName: true,
      request: (person) => this.api.addMember(this.clubId(), AddClubMemberRequest.parse(person)),
      done: (m) => `${m.displayName} is now a club ${m.role}.`,
    },
    remove: {
      label: 'Remove',
      ariaLabel: (m) => `Remove ${m.displayName} from the club`,
      // An officer cannot remove themselves here: the club would be left without its officer by a slip.
      allowed: (m, me) => m.userId !== me,
      confirmation: (m) => ({
        title: `Remove ${m.displayName} from the club?`,
        message: `${m.displayName} (${m.email}) will no longer see the club’s season results. Their own records stay as they are.`,
        confirmLabel: 'Remove member',
      }),
      request: (m) => this.api.removeMember(this.clubId(), m.userId),
      done: (m) => `${m.displayName} was removed from the club.`,
    },
  };
}
