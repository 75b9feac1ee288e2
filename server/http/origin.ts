import type { Request } from 'express';
import type { Config } from '../config';

/**
 * The origin links in e-mail point at. Production always names it (PUBLIC_ORIGIN is
 * required there, so a forged Host header can never redirect a link); elsewhere the
 * request's own origin keeps links working on whatever port a developer or test uses.
 */
export const linkOrigin = (config: Config, req?: Request) =>
  config.publicOrigin ??
  (req ? `${req.protocol}://${req.get('host')}` : `http://${config.host}:${config.port}`);
