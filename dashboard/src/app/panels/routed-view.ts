import { linkedSignal, inject, type Signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute, Router } from '@angular/router';
import { map } from 'rxjs';
import type { QueryParams } from './query-view';

/** A panel's view kept in the address, and the way to change it. */
export interface RoutedView<V> {
  view: Signal<V>;
  /** Puts a new view in the address (replacing the entry unless `history`), which the view signal then follows. */
  show(view: V, history?: boolean): void;
}

/**
 * The view of the routed panel being built, read from its query parameters with `fromParams` and
 * written back with `toParams`, so a view can be shared and bookmarked. Call in an injection context.
 */
export function routedView<V>(fromParams: (params: QueryParams) => V, toParams: (view: V) => Record<string, string>): RoutedView<V> {
  const route = inject(ActivatedRoute);
  const router = inject(Router);
  const view = toSignal(route.queryParams.pipe(map((p) => fromParams(p))), { initialValue: fromParams(route.snapshot.queryParams) });
  return {
    view,
    show: (next, history = false) => void router.navigate([], { relativeTo: route, queryParams: toParams(next), replaceUrl: !history }),
  };
}

/** What a panel needs of an httpResource: whether it holds a value, and the value. */
interface ValueSource<T> {
  hasValue(): boolean;
  value(): T | undefined;
}

/**
 * The last report received: it stays in view while the next one (other filters, other weights)
 * is worked out, so the page does not jump back to its loading state on every change.
 */
export function lastValue<T>(resource: ValueSource<T>): Signal<T | undefined> {
  return linkedSignal<T | undefined, T | undefined>({
    source: () => (resource.hasValue() ? resource.value() : undefined),
    computation: (next, previous) => next ?? previous?.value,
  });
}
