import { Provider } from '@angular/core';
import { ErrorStateMatcher, ShowOnDirtyErrorStateMatcher } from '@angular/material/core';

/**
 * Fields show their message while the breeder types, not only after leaving the field.
 * Provided by the two roots of every form (the sign-in screen and the frame) rather than the
 * app config, so Material stays out of the first download.
 */
export const validateAsYouType: Provider = { provide: ErrorStateMatcher, useClass: ShowOnDirtyErrorStateMatcher };
