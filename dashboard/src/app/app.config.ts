import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { ApplicationConfig, provideBrowserGlobalErrorListeners } from '@angular/core';
import { provideRouter, TitleStrategy, withComponentInputBinding, withInMemoryScrolling } from '@angular/router';
import { routes } from './app.routes';
import { PageTitle } from './page-title';
import { csrfInterceptor } from './session/csrf-interceptor';
import { sessionExpiryInterceptor } from './session/session-expiry-interceptor';

export const appConfig: ApplicationConfig = {
  providers: [
    provideBrowserGlobalErrorListeners(),
    provideRouter(routes, withComponentInputBinding(), withInMemoryScrolling({ scrollPositionRestoration: 'top' })),
    provideHttpClient(withInterceptors([csrfInterceptor, sessionExpiryInterceptor])),
    { provide: TitleStrategy, useClass: PageTitle },
  ],
};
