import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { filter, finalize, switchMap, tap } from 'rxjs';
import { AddClubMemberRequest, ClubMember } from '@shared/contracts/clubs';
import { CLUB_ROLES, ClubRole, ROLE_DESCRIPTIONS } from '@shared/contracts/roles';
import { showFieldErrors } from '../forms/field-errors';
import { zodValidator } from '../forms/zod-validator';
import { Session } from '../session/session';
import { confirmWith } from '../status/confirm-dialog';
import { describeFailure } from '../status/describe-failure';
import { RoleGuide } from '../roles/role-guide';
import { LoadError } from '../status/load-error';
import { ClubsApi } from './clubs-api';

@Component({
  selector: 'kl-club-members',
  templateUrl: './club-members.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    MatTableModule,
    LoadError,
    RoleGuide,
  ],
})
export class ClubMembers {
  private readonly api = inject(ClubsApi);
  private readonly session = inject(Session);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly clubId = input.required<string>();

  protected readonly membership = computed(
    () => this.session.user()?.clubs.find((c) => String(c.id) === this.clubId()) ?? null,
  );
  protected readonly myUserId = computed(() => this.session.user()?.id);
  /** Officers add and remove members; the API refuses anyone else as well. */
  protected readonly canManage = computed(() => this.membership()?.role === 'officer');
  protected readonly columns = computed(() => (this.canManage() ? ['person', 'role', 'actions'] : ['person', 'role']));
  protected readonly members = this.api.members(this.clubId);
  protected readonly roles = CLUB_ROLES;
  protected readonly myRoleDescription = computed(() => {
    const role = this.membership()?.role;
    return role ? ROLE_DESCRIPTIONS[role] : '';
  });

  private readonly blank = { email: '', role: 'member' as ClubRole, exhibitorName: '' };
  protected readonly addForm = inject(NonNullableFormBuilder).group({
    email: [this.blank.email, zodValidator(AddClubMemberRequest.shape.email)],
    role: [this.blank.role, zodValidator(AddClubMemberRequest.shape.role)],
    exhibitorName: [this.blank.exhibitorName, zodValidator(AddClubMemberRequest.shape.exhibitorName)],
  });
  protected readonly adding = signal(false);
  protected readonly addFailure = signal<string | null>(null);
  protected readonly removing = signal<number | null>(null);

  protected add(formDirective: FormGroupDirective): void {
    if (this.adding()) return;
    if (this.addForm.invalid) {
      this.addForm.markAllAsDirty();
      return;
    }
    this.adding.set(true);
    this.addFailure.set(null);
    const { exhibitorName, ...rest } = this.addForm.getRawValue();
    // An empty exhibitor name means "none", which the contract spells null.
    const request = AddClubMemberRequest.parse({ ...rest, exhibitorName: exhibitorName.trim() || null });
    this.api
      .addMember(this.clubId(), request)
      .pipe(finalize(() => this.adding.set(false)))
      .subscribe({
        next: (member) => {
          this.members.update((list) => [...(list ?? []).filter((m) => m.userId !== member.userId), member]);
          formDirective.resetForm(this.blank);
          this.snackBar.open(`${member.displayName} is now a club ${member.role}.`, 'OK', { duration: 5000 });
        },
        error: (err: unknown) => {
          const failure = describeFailure(err);
          if (!showFieldErrors(this.addForm, failure.fields)) this.addFailure.set(failure.message);
        },
      });
  }

  protected remove(member: ClubMember): void {
    confirmWith(this.dialog, {
      title: `Remove ${member.displayName} from the club?`,
      message: `${member.displayName} (${member.email}) will no longer see the club’s season results. Their own records stay as they are.`,
      confirmLabel: 'Remove member',
    })
      .pipe(
        filter(Boolean),
        tap(() => this.removing.set(member.userId)),
        switchMap(() => this.api.removeMember(this.clubId(), member.userId)),
        finalize(() => this.removing.set(null)),
      )
      .subscribe({
        next: () => {
          this.members.update((list) => (list ?? []).filter((m) => m.userId !== member.userId));
          this.snackBar.open(`${member.displayName} was removed from the club.`, 'OK', { duration: 5000 });
        },
        error: (err: unknown) => this.snackBar.open(describeFailure(err).message, 'Dismiss'),
      });
  }
}
