import type { Routes } from '@angular/router';
import { adminGuard } from '../breeds/admin-guard';

/** The herd and show records screens, each its own lazy chunk, under /r/:rabbitryId. */
export const RABBITRY_RECORD_ROUTES: Routes = [
  { path: 'herd', title: 'Herd', loadComponent: () => import('../herd/herd').then((m) => m.Herd) },
  { path: 'animals/:animalId', title: 'Animal', loadComponent: () => import('../animal/animal-profile').then((m) => m.AnimalProfile) },
  { path: 'litters', title: 'Litters', loadComponent: () => import('../litters/litters').then((m) => m.Litters) },
  { path: 'imports', title: 'Imports', loadComponent: () => import('../imports/imports').then((m) => m.Imports) },
];

/** Under /c/:clubId. */
export const CLUB_RECORD_ROUTES: Routes = [
  { path: 'shows', title: 'Shows and results', loadComponent: () => import('../shows/shows').then((m) => m.Shows) },
  { path: 'shows/:showId', title: 'Show results', loadComponent: () => import('../shows/show-results').then((m) => m.ShowResults) },
  { path: 'imports', title: 'Imports', loadComponent: () => import('../imports/imports').then((m) => m.Imports) },
];

/** Site-wide, for administrators. */
export const SITE_RECORD_ROUTES: Routes = [
  {
    path: 'admin/breeds',
    title: 'Breed catalogue',
    canActivate: [adminGuard],
    loadComponent: () => import('../breeds/breed-catalogue').then((m) => m.BreedCatalogue),
  },
];
