import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, viewChild } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatListModule } from '@angular/material/list';
import { MatMenuModule } from '@angular/material/menu';
import { MatSelectChange, MatSelectModule } from '@angular/material/select';
import { MatSidenav, MatSidenavModule } from '@angular/material/sidenav';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatToolbarModule } from '@angular/material/toolbar';
import { ActivatedRouteSnapshot, NavigationEnd, Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { filter, map } from 'rxjs';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { Session } from '../session/session';
import { describeFailure } from '../status/describe-failure';
import { navigationFor } from './navigation';
import { ContextParams, WorkingContext, workingContextFor } from './working-context';

/** Phones get the navigation as an overlay drawer; wider screens keep it beside the page. */
const PHONE = '(max-width: 600px)';

@Component({
  selector: 'kl-frame',
  providers: [validateAsYouType],
  templateUrl: './frame.html',
  styleUrl: './frame.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterOutlet,
    RouterLink,
    RouterLinkActive,
    MatToolbarModule,
    MatSidenavModule,
    MatListModule,
    MatMenuModule,
    MatButtonModule,
    MatFormFieldModule,
    MatSelectModule,
  ],
})
export class Frame {
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  private readonly drawer = viewChild<MatSidenav>('drawer');

  protected readonly isPhone = toSignal(inject(BreakpointObserver).observe(PHONE).pipe(map((state) => state.matches)), {
    initialValue: false,
  });
  // Null only for the moment between a session ending and the move to sign-in.
  protected readonly user = this.session.user;
  private readonly params = toSignal(
    this.router.events.pipe(
      filter((event) => event instanceof NavigationEnd),
      map(() => paramsOf(this.router.routerState.snapshot.root)),
    ),
    { initialValue: paramsOf(this.router.routerState.snapshot.root) },
  );
  protected readonly context = computed<WorkingContext>(() => {
    const user = this.user();
    return user ? workingContextFor(user, this.params()) : { kind: 'everything' };
  });
  protected readonly navigation = computed(() => {
    const user = this.user();
    return user ? navigationFor(user, this.context()) : [];
  });
  protected readonly contextKey = computed(() => keyOf(this.context()));
  protected readonly contextName = computed(() => {
    const context = this.context();
    return context.kind === 'everything' ? 'Everything I belong to' : context.name;
  });

  constructor() {
    this.router.events
      .pipe(
        filter((event) => event instanceof NavigationEnd),
        takeUntilDestroyed(inject(DestroyRef)),
      )
      .subscribe(() => {
        if (this.isPhone()) void this.drawer()?.close();
      });
  }

  protected switchTo(change: MatSelectChange): void {
    const [kind, id] = String(change.value).split(':');
    void this.router.navigate(kind === 'r' ? ['/r', id] : kind === 'c' ? ['/c', id] : ['/']);
  }

  protected skipToMain(event: Event): void {
    event.preventDefault();
    document.getElementById('main')?.focus();
  }

  protected signOut(): void {
    this.session.signOut().subscribe({
      next: () => void this.router.navigate(['/sign-in']),
      error: (err: unknown) => this.snackBar.open(describeFailure(err).message, 'Dismiss'),
    });
  }
}

function keyOf(context: WorkingContext): string {
  if (context.kind === 'rabbitry') return `r:${context.id}`;
  if (context.kind === 'club') return `c:${context.id}`;
  return 'everything';
}

function paramsOf(root: ActivatedRouteSnapshot): ContextParams {
  const params: Record<string, string> = {};
  for (let route: ActivatedRouteSnapshot | null = root; route; route = route.firstChild) Object.assign(params, route.params);
  return { rabbitryId: params['rabbitryId'], clubId: params['clubId'] };
}
