import { Router } from 'express';
import { changePasswordBody, signInBody, signUpBody, updateAccountBody } from '../../shared/api/auth';
import type { AppContext } from '../context';
import { clientIp, signedInUser } from '../http/current-user';
import { SESSION_COOKIE } from '../http/session';
import { parse } from '../http/validate';
import { changePassword, rename, sessionViewOf, signIn, signUp } from '../services/auth';
import type { Request } from 'express';

/** New session id at every sign-in (OWASP session fixation), then the user goes in it. */
function establishSession(req: Request, userId: string, authAt = Date.now()) {
  return new Promise<void>((resolve, reject) =>
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = userId;
      req.session.authAt = authAt;
      req.session.save((e) => (e ? reject(e) : resolve()));
    }),
  );
}

export function authRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;

  r.post('/auth/sign-up', async (req, res) => {
    const body = parse(signUpBody, req.body);
    // An invitation's secret rides along: limited like the invitation's own endpoints.
    if (body.invitationToken) await ctx.linkLimiters.linksPerAddress.consume(clientIp(req));
    const user = await signUp(db, body, clientIp(req));
    await establishSession(req, user.id);
    res.status(201).json(await sessionViewOf(db, user));
  });

  r.post('/auth/sign-in', async (req, res) => {
    const body = parse(signInBody, req.body);
    const user = await signIn(db, ctx.signInLimiter, body, clientIp(req));
    await establishSession(req, user.id);
    res.json(await sessionViewOf(db, user));
  });

  r.post('/auth/sign-out', async (req, res) => {
    if (req.session) await new Promise<void>((done) => req.session.destroy(() => done()));
    res.clearCookie(SESSION_COOKIE).status(204).end();
  });

  r.get('/auth/me', async (_req, res) => {
    res.json(await sessionViewOf(db, signedInUser(res)));
  });

  r.patch('/account', async (req, res) => {
    const body = parse(updateAccountBody, req.body);
    res.json(await rename(db, signedInUser(res), body.name));
  });

  r.post('/account/password', async (req, res) => {
    const user = signedInUser(res);
    const body = parse(changePasswordBody, req.body);
    const changedAt = await changePassword(db, user, body, clientIp(req));
    // Other sessions predate the change and stop working; this one is renewed.
    await establishSession(req, user.id, changedAt.getTime());
    res.status(204).end();
  });

  return r;
}
