import { BreakpointObserver } from '@angular/cdk/layout';
import { inject, type Signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { map } from 'rxjs';

/** Whether a media query holds now, following the window as it changes. Call in an injection context. */
export function mediaMatches(query: string, initialValue: boolean): Signal<boolean> {
  return toSignal(inject(BreakpointObserver).observe(query).pipe(map((s) => s.matches)), { initialValue });
}

/** The width under which a panel lays itself out for a phone. */
export const PHONE_WIDTH = '(max-width: 600px)';
