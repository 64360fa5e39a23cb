import { Routes } from '@angular/router';
import { authGuard, signedOutGuard } from './session/auth-guard';
import { clubMemberGuard, rabbitryMemberGuard } from './session/role-guard';
import { CLUB_RECORD_ROUTES, RABBITRY_RECORD_ROUTES, SITE_RECORD_ROUTES } from './records/records-routes';

export const routes: Routes = [
  {
    path: 'sign-in',
    title: 'Sign in',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./sign-in/sign-in').then((m) => m.SignIn),
  },
  {
    path: 'error',
    title: 'Something went wrong',
    loadComponent: () => import('./status/error-page').then((m) => m.ErrorPage),
  },
  {
    path: '',
    canActivate: [authGuard],
    loadComponent: () => import('./frame/frame').then((m) => m.Frame),
    children: [
      { path: '', title: 'Overview', loadComponent: () => import('./home/home').then((m) => m.Home) },
      {
        path: 'preferences',
        title: 'Preferences',
        loadComponent: () => import('./preferences/preferences').then((m) => m.Preferences),
      },
      ...SITE_RECORD_ROUTES,
      {
        path: 'r/:rabbitryId',
        canActivate: [rabbitryMemberGuard],
        children: [
          {
            path: '',
            title: 'Rabbitry',
            loadComponent: () => import('./rabbitry/rabbitry-overview').then((m) => m.RabbitryOverview),
          },
          {
            path: 'access',
            title: 'Access',
            loadComponent: () => import('./rabbitry/rabbitry-access').then((m) => m.RabbitryAccess),
          },
          ...RABBITRY_RECORD_ROUTES,
          {
            path: 'keepers',
            title: 'Keeper board',
            loadComponent: () => import('./keepers/keeper-board').then((m) => m.KeeperBoard),
          },
          {
            path: 'sires-dams',
            title: 'Sires & dams',
            loadComponent: () => import('./sire-dam/sire-dam-report').then((m) => m.SireDamReport),
          },
          {
            path: 'traits',
            title: 'Trait inheritance',
            loadComponent: () => import('./traits/trait-inheritance').then((m) => m.TraitInheritance),
          },
          {
            path: 'growth',
            title: 'Growth curves',
            loadComponent: () => import('./growth/growth-curves').then((m) => m.GrowthCurves),
          },
          {
            path: 'pairing',
            title: 'Pairing planner',
            loadComponent: () => import('./pairing/pairing-planner').then((m) => m.PairingPlanner),
          },
          {
            path: 'lines',
            title: 'Line comparison',
            loadComponent: () => import('./lines/line-comparison').then((m) => m.LineComparison),
          },
        ],
      },
      {
        path: 'c/:clubId',
        canActivate: [clubMemberGuard],
        children: [
          {
            path: '',
            title: 'Club',
            loadComponent: () => import('./club/club-overview').then((m) => m.ClubOverview),
          },
          {
            path: 'members',
            title: 'Club members',
            loadComponent: () => import('./club/club-members').then((m) => m.ClubMembers),
          },
          {
            path: 'season',
            title: 'Season',
            loadComponent: () => import('./season/club-season').then((m) => m.ClubSeason),
          },
          ...CLUB_RECORD_ROUTES,
        ],
      },
      // Inside the frame, so a signed-in breeder keeps the navigation; guards also land here.
      { path: '**', title: 'Not found', loadComponent: () => import('./status/not-found').then((m) => m.NotFound) },
    ],
  },
];
