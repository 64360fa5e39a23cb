import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import type { HttpResourceRef } from '@angular/common/http';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { filter, finalize, switchMap, tap, type Observable } from 'rxjs';
import type * as z from 'zod';
import { ClubRole, RabbitryRole, ROLE_DESCRIPTIONS } from '@shared/contracts/roles';
import { showFieldErrors } from '../forms/field-errors';
import { zodValidator } from '../forms/zod-validator';
import { RoleGuide } from '../roles/role-guide';
import { Session } from '../session/session';
import { confirmWith, type Confirmation } from '../status/confirm-dialog';
import { describeFailure } from '../status/describe-failure';
import { LoadError } from '../status/load-error';

type Role = RabbitryRole | ClubRole;

/** A person on the list: a member of a club, or someone with access to a rabbitry. */
export interface ListedPerson {
  userId: number;
  displayName: string;
  email: string;
  role: Role;
  exhibitorName?: string | null;
}

/** What a request to add someone holds; the schema is the API's own. */
type AddFields = z.ZodObject<{ email: z.ZodType; role: z.ZodType; exhibitorName?: z.ZodType }>;

/** The words and rules of one place's list: who may be added as what, who may be taken off. */
export interface MemberListPlace<P extends ListedPerson> {
  lede: string;
  listHeading: string;
  personHeading: string;
  loadingLabel: string;
  loadFailure: string;
  emptyList: string;
  /** Said to someone who may read the list but not change it. */
  whoManages: string;
  roles: readonly Role[];
  add: {
    heading: string;
    intro: string;
    submitLabel: string;
    schema: AddFields;
    /** The roles a new person may be given, the first being the default, each with a hint. */
    roles: readonly { value: Role; label: string; hint?: string }[];
    /** Clubs name how a member appears in show results. */
    exhibitorName: boolean;
    request(person: { email: string; role: Role; exhibitorName?: string | null }): Observable<P>;
    done(person: P): string;
  };
  remove: {
    label: string;
    ariaLabel(person: P): string;
    allowed(person: P, me: number | undefined): boolean;
    confirmation(person: P): Confirmation;
    request(person: P): Observable<void>;
    done(person: P): string;
  };
}

/**
 * The people of a rabbitry or a club: the list with each one's role, a form to add someone and a
 * way to take someone off, for those allowed to manage it (the API refuses anyone else as well),
 * and what each role may do.
 */
@Component({
  selector: 'kl-member-list',
  templateUrl: './member-list.html',
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
export class MemberList<P extends ListedPerson> {
  private readonly session = inject(Session);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly forms = inject(NonNullableFormBuilder);

  readonly title = input.required<string>();
  /** Fixed for the page: the add form is built from it once. */
  readonly place = input.required<MemberListPlace<P>>();
  readonly people = input.required<HttpResourceRef<P[] | undefined>>();
  /** The viewer's own role here. */
  readonly myRole = input.required<Role | null>();
  readonly canManage = input.required<boolean>();

  protected readonly myUserId = computed(() => this.session.user()?.id);
  protected readonly columns = computed(() => (this.canManage() ? ['person', 'role', 'actions'] : ['person', 'role']));
  protected readonly myRoleDescription = computed(() => {
    const role = this.myRole();
    return role ? ROLE_DESCRIPTIONS[role] : '';
  });

  private readonly blank = computed(() => ({ email: '', role: this.place().add.roles[0]!.value, exhibitorName: '' }));
  protected readonly addForm = computed(() => {
    const { schema } = this.place().add;
    const blank = this.blank();
    return this.forms.group({
      email: [blank.email, zodValidator(schema.shape.email)],
      role: [blank.role, zodValidator(schema.shape.role)],
      exhibitorName: [blank.exhibitorName, schema.shape.exhibitorName ? zodValidator(schema.shape.exhibitorName) : []],
    });
  });
  protected readonly hint = (role: Role) => this.place().add.roles.find((r) => r.value === role)?.hint ?? '';
  protected readonly adding = signal(false);
  protected readonly addFailure = signal<string | null>(null);
  protected readonly removing = signal<number | null>(null);

  protected add(formDirective: FormGroupDirective): void {
    const form = this.addForm();
    if (this.adding()) return;
    if (form.invalid) {
      form.markAllAsDirty();
      return;
    }
    this.adding.set(true);
    this.addFailure.set(null);
    const { add } = this.place();
    const { exhibitorName, ...rest } = form.getRawValue();
    // An empty exhibitor name means "none", which the contract spells null.
    const request = add.schema.parse(add.exhibitorName ? { ...rest, exhibitorName: exhibitorName.trim() || null } : rest);
    add
      .request(request as { email: string; role: Role })
      .pipe(finalize(() => this.adding.set(false)))
      .subscribe({
        next: (person) => {
          this.people().update((list) => [...(list ?? []).filter((m) => m.userId !== person.userId), person]);
          formDirective.resetForm(this.blank());
          this.snackBar.open(add.done(person), 'OK', { duration: 5000 });
        },
        error: (err: unknown) => {
          const failure = describeFailure(err);
          if (!showFieldErrors(form, failure.fields)) this.addFailure.set(failure.message);
        },
      });
  }

  protected remove(person: P): void {
    const { remove } = this.place();
    confirmWith(this.dialog, remove.confirmation(person))
      .pipe(
        filter(Boolean),
        tap(() => this.removing.set(person.userId)),
        switchMap(() => remove.request(person)),
        finalize(() => this.removing.set(null)),
      )
      .subscribe({
        next: () => {
          this.people().update((list) => (list ?? []).filter((m) => m.userId !== person.userId));
          this.snackBar.open(remove.done(person), 'OK', { duration: 5000 });
        },
        error: (err: unknown) => this.snackBar.open(describeFailure(err).message, 'Dismiss'),
      });
  }
}
