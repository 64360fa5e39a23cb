import { Routes } from '@angular/router';
import { authGuard, signedOutGuard } from './session/auth-guard';
import { clubMemberGuard, rabbitryMemberGuard } from './session/role-guard';

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
        ],
      },
      // Inside the frame, so a signed-in breeder keeps the navigation; guards also land here.
      { path: '**', title: 'Not found', loadComponent: () => import('./status/not-found').then((m) => m.NotFound) },
    ],
  },
];
