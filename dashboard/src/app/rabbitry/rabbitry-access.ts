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
import { GrantRabbitryAccessRequest, RabbitryMember } from '@shared/contracts/rabbitries';
import { RABBITRY_ROLES, ROLE_DESCRIPTIONS } from '@shared/contracts/roles';
import { showFieldErrors } from '../forms/field-errors';
import { zodValidator } from '../forms/zod-validator';
import { Session } from '../session/session';
import { confirmWith } from '../status/confirm-dialog';
import { describeFailure } from '../status/describe-failure';
import { RoleGuide } from '../roles/role-guide';
import { LoadError } from '../status/load-error';
import { RabbitriesApi } from './rabbitries-api';

type GrantableRole = 'partner' | 'mentor';

@Component({
  selector: 'kl-rabbitry-access',
  templateUrl: './rabbitry-access.html',
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
export class RabbitryAccess {
  private readonly api = inject(RabbitriesApi);
  private readonly session = inject(Session);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly rabbitryId = input.required<string>();

  protected readonly membership = computed(
    () => this.session.user()?.rabbitries.find((r) => String(r.id) === this.rabbitryId()) ?? null,
  );
  protected readonly myUserId = computed(() => this.session.user()?.id);
  /** Only the owner grants and revokes; the API refuses anyone else as well. */
  protected readonly canManage = computed(() => this.membership()?.role === 'owner');
  protected readonly columns = computed(() => (this.canManage() ? ['person', 'role', 'actions'] : ['person', 'role']));
  protected readonly members = this.api.members(this.rabbitryId);
  protected readonly roles = RABBITRY_ROLES;
  protected readonly myRoleDescription = computed(() => {
    const role = this.membership()?.role;
    return role ? ROLE_DESCRIPTIONS[role] : '';
  });

  protected readonly grantForm = inject(NonNullableFormBuilder).group({
    email: ['', zodValidator(GrantRabbitryAccessRequest.shape.email)],
    role: ['mentor' as GrantableRole, zodValidator(GrantRabbitryAccessRequest.shape.role)],
  });
  protected readonly granting = signal(false);
  protected readonly grantFailure = signal<string | null>(null);
  protected readonly revoking = signal<number | null>(null);

  protected grant(formDirective: FormGroupDirective): void {
    if (this.granting()) return;
    if (this.grantForm.invalid) {
      this.grantForm.markAllAsDirty();
      return;
    }
    this.granting.set(true);
    this.grantFailure.set(null);
    const request = GrantRabbitryAccessRequest.parse(this.grantForm.getRawValue());
    this.api
      .grant(this.rabbitryId(), request)
      .pipe(finalize(() => this.granting.set(false)))
      .subscribe({
        next: (member) => {
          this.members.update((list) => [...(list ?? []).filter((m) => m.userId !== member.userId), member]);
          formDirective.resetForm({ email: '', role: 'mentor' });
          this.snackBar.open(`${member.displayName} now has ${member.role} access.`, 'OK', { duration: 5000 });
        },
        error: (err: unknown) => {
          const failure = describeFailure(err);
          if (!showFieldErrors(this.grantForm, failure.fields)) this.grantFailure.set(failure.message);
        },
      });
  }

  protected revoke(member: RabbitryMember): void {
    confirmWith(this.dialog, {
      title: `Revoke access for ${member.displayName}?`,
      message: `${member.displayName} (${member.email}) will no longer see this rabbitry. You can grant access again later.`,
      confirmLabel: 'Revoke access',
    })
      .pipe(
        filter(Boolean),
        tap(() => this.revoking.set(member.userId)),
        switchMap(() => this.api.revoke(this.rabbitryId(), member.userId)),
        finalize(() => this.revoking.set(null)),
      )
      .subscribe({
        next: () => {
          this.members.update((list) => (list ?? []).filter((m) => m.userId !== member.userId));
          this.snackBar.open(`${member.displayName} no longer has access.`, 'OK', { duration: 5000 });
        },
        error: (err: unknown) => this.snackBar.open(describeFailure(err).message, 'Dismiss'),
      });
  }
}
