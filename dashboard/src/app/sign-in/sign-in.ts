import { ChangeDetectionStrategy, Component, ElementRef, afterNextRender, inject, input, signal, viewChild } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router } from '@angular/router';
import { SignInRequest } from '@shared/contracts/session';
import { showFieldErrors } from '../forms/field-errors';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { zodValidator } from '../forms/zod-validator';
import { safeReturnUrl } from '../session/return-url';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';

@Component({
  selector: 'kl-sign-in',
  providers: [validateAsYouType],
  templateUrl: './sign-in.html',
  styleUrl: './sign-in.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatProgressBarModule],
})
export class SignIn {
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly emailInput = viewChild.required<ElementRef<HTMLInputElement>>('emailInput');

  readonly returnUrl = input<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', zodValidator(SignInRequest.shape.email)],
    password: ['', zodValidator(SignInRequest.shape.password)],
  });
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly passwordVisible = signal(false);

  constructor() {
    afterNextRender(() => this.emailInput().nativeElement.focus());
  }

  protected submit(): void {
    if (this.submitting()) return;
    if (this.form.invalid) {
      this.form.markAllAsDirty();
      this.host.nativeElement.querySelector<HTMLElement>('input.ng-invalid')?.focus();
      return;
    }
    this.submitting.set(true);
    this.failure.set(null);
    this.session.signIn(SignInRequest.parse(this.form.getRawValue())).subscribe({
      next: () => void this.router.navigateByUrl(safeReturnUrl(this.returnUrl())),
      error: (err: unknown) => {
        const failure = describeFailure(err);
        showFieldErrors(this.form, failure.fields);
        this.failure.set(failure.message);
        this.submitting.set(false);
        // A wrong password is retyped at once: focus it with its text selected, so typing
        // replaces it. The alert region announces the message either way.
        if (failure.code === 'bad-credentials') {
          const password = this.host.nativeElement.querySelector<HTMLInputElement>('input[name="password"]');
          password?.focus();
          password?.select();
        }
      },
    });
  }
}
