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
