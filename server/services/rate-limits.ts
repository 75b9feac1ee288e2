import { RateLimiterMemory, type RateLimiterRes } from 'rate-limiter-flexible';
import { rateLimited } from './errors';

export type RateLimitSettings = { perAccount: number; perAddress: number; windowSeconds: number };

export const defaultSignInLimits: RateLimitSettings = {
  perAccount: 5,
  perAddress: 30,
  windowSeconds: 15 * 60,
};

/**
 * Failed sign-ins are counted per account and per address (OWASP Authentication cheat
 * sheet: throttle both, to slow guessing of one account and spraying of many).
 */
export function createSignInLimiter(settings: RateLimitSettings) {
  const account = new RateLimiterMemory({ points: settings.perAccount, duration: settings.windowSeconds });
  const address = new RateLimiterMemory({ points: settings.perAddress, duration: settings.windowSeconds });

  return {
    /** Throws 429 if either key is already exhausted; counts nothing. */
    async check(email: string, ip: string) {
      const [a, b] = await Promise.all([account.get(email), address.get(ip)]);
      const blocked = [a, b].filter(
        (r, i): r is RateLimiterRes =>
          !!r && r.consumedPoints >= [settings.perAccount, settings.perAddress][i],
      );
      if (blocked.length) throw rateLimited(Math.max(...blocked.map((r) => r.msBeforeNext)) / 1000);
    },
    async fail(email: string, ip: string) {
      await Promise.all([account.penalty(email, 1), address.penalty(ip, 1)]);
    },
    async succeed(email: string) {
      await account.delete(email);
    },
  };
}
export type SignInLimiter = ReturnType<typeof createSignInLimiter>;

export type Limit = { points: number; windowSeconds: number };

/** A plain request counter: every call counts, and the one past the limit gets 429. */
export function createLimiter(limit: Limit) {
  const limiter = new RateLimiterMemory({ points: limit.points, duration: limit.windowSeconds });
  return {
    async consume(key: string) {
      try {
        await limiter.consume(key);
      } catch (res) {
        if (res instanceof Error) throw res;
        throw rateLimited((res as RateLimiterRes).msBeforeNext / 1000);
      }
    },
  };
}
export type Limiter = ReturnType<typeof createLimiter>;

/**
 * Limits on the endpoints that send mail or take a link's secret (OWASP Forgot Password
 * cheat sheet: throttle reset requests; the per-address limit also slows guessing links).
 */
export type LinkLimitSettings = {
  resetPerEmail: Limit;
  resetPerAddress: Limit;
  invitationsPerUser: Limit;
  linksPerAddress: Limit;
};

export const defaultLinkLimits: LinkLimitSettings = {
  resetPerEmail: { points: 3, windowSeconds: 3600 },
  resetPerAddress: { points: 20, windowSeconds: 3600 },
  invitationsPerUser: { points: 30, windowSeconds: 3600 },
  linksPerAddress: { points: 60, windowSeconds: 15 * 60 },
};

export function createLinkLimiters(settings: LinkLimitSettings) {
  return {
    resetPerEmail: createLimiter(settings.resetPerEmail),
    resetPerAddress: createLimiter(settings.resetPerAddress),
    invitationsPerUser: createLimiter(settings.invitationsPerUser),
    linksPerAddress: createLimiter(settings.linksPerAddress),
  };
}
export type LinkLimiters = ReturnType<typeof createLinkLimiters>;
