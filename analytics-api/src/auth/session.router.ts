import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type passport from 'passport';
import { SignInRequest, UpdatePreferencesRequest } from '@shared/contracts/session';
import { PUBLIC, SIGNED_IN } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { AppError } from '../http/app-error';
import { validate } from '../http/validate';
import type { SessionService } from './session.service';

export interface CsrfTokens { generate(req: Parameters<RequestHandler>[0], overwrite?: boolean): string }

export function registerSessionRoutes(
  r: RouteRegistrar,
  deps: { passport: passport.PassportStatic; sessions: SessionService; csrf: CsrfTokens; signInLimit: number },
): void {
  const { sessions, csrf } = deps;

  // Failed attempts per address and account; successful sign-ins do not count.
  const signInLimiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: deps.signInLimit,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').toLowerCase()}`,
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate-limited', message: 'Too many failed sign-ins; wait 15 minutes and try again' } });
    },
  });

  r.add('get', '/csrf', PUBLIC, (req, res) => {
    res.json({ csrfToken: csrf.generate(req) });
  });

  r.add('post', '/session', PUBLIC, signInLimiter, async (req, res, next) => {
    validate(SignInRequest, req.body);
    deps.passport.authenticate('local', (err: unknown, user: Express.User | false) => {
      if (err) return next(err);
      if (!user) return next(new AppError('bad-credentials', 'That e-mail and password do not match an account', 401));
      // passport ≥ 0.6 regenerates the session here, so a pre-sign-in session id is never reused.
      req.login(user, async (loginErr) => {
        if (loginErr) return next(loginErr);
        try {
          res.json({ user: await sessions.currentUser(user.id), csrfToken: csrf.generate(req, true) });
        } catch (e) {
          next(e);
        }
      });
    })(req, res, next);
  });

  r.add('get', '/session', SIGNED_IN, async (req, res) => {
    res.json({ user: await sessions.currentUser(req.user!.id), csrfToken: csrf.generate(req) });
  });

  r.add('delete', '/session', SIGNED_IN, (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy(() => res.status(204).end());
    });
  });

  r.add('patch', '/me/preferences', SIGNED_IN, async (req, res) => {
    const prefs = validate(UpdatePreferencesRequest, req.body);
    await sessions.updatePreferences(req.user!.id, prefs);
    res.json({ user: await sessions.currentUser(req.user!.id), csrfToken: csrf.generate(req) });
  });
}
