import { Router } from 'express';
import {
  passwordResetBody,
  passwordResetParams,
  passwordResetRequestBody,
} from '../../shared/api/password-reset';
import type { AppContext } from '../context';
import { clientIp } from '../http/current-user';
import { linkOrigin } from '../http/origin';
import { SESSION_COOKIE } from '../http/session';
import { parse } from '../http/validate';
import {
  RESET_REQUESTED,
  lookUpPasswordReset,
  requestPasswordReset,
  resetPassword,
} from '../services/password-reset';

export function passwordResetRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx;
  const limits = ctx.linkLimiters;

  r.post('/auth/password-reset', async (req, res) => {
    const { email } = parse(passwordResetRequestBody, req.body);
    const ip = clientIp(req);
    // Both limits count known and unknown addresses alike, so a 429 reveals nothing either.
    await limits.resetPerAddress.consume(ip);
    await limits.resetPerEmail.consume(email);
    res.status(202).json({ message: RESET_REQUESTED });
    // After the answer, so its timing is the same whether or not an account uses the address.
    requestPasswordReset(db, email, linkOrigin(ctx.config, req), ip).catch((err) =>
      req.log.error({ err }, 'password reset request failed'),
    );
  });

  r.get('/auth/password-reset/:token', async (req, res) => {
    await limits.linksPerAddress.consume(clientIp(req));
    const { token } = parse(passwordResetParams, req.params, 'path');
    res.json(await lookUpPasswordReset(db, token));
  });

  r.post('/auth/password-reset/:token', async (req, res) => {
    await limits.linksPerAddress.consume(clientIp(req));
    const { token } = parse(passwordResetParams, req.params, 'path');
    const { newPassword } = parse(passwordResetBody, req.body);
    await resetPassword(db, token, newPassword, clientIp(req));
    // A session in this browser predates the change too; it is ended here rather than left stale.
    if (req.session?.userId) await new Promise<void>((done) => req.session.destroy(() => done()));
    res.clearCookie(SESSION_COOKIE).status(204).end();
  });

  return r;
}
