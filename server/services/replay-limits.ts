// "Replay with chance" runs replicates in the projection workers for anyone holding a
// class link, so it is limited per link (or signed-in person) and per address, as sign-in
// is (OWASP Authentication cheat sheet: throttle per key and per source), and the number
// of replays in flight is capped so a class pressing at once cannot crowd out projections.
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { rateLimited } from './errors';

export type ReplayLimitSettings = {
  /** Replays per class link, or per signed-in person, in the window. */
  perSource: number;
  /** Replays per client address in the window. */
  perAddress: number;
  windowSeconds: number;
  /** Replays running or waiting for a worker at once. */
  inFlight: number;
};

export const defaultReplayLimits: ReplayLimitSettings = {
  // A class of 30 pressing the button a few times each in ten minutes.
  perSource: 120,
  perAddress: 60,
  windowSeconds: 10 * 60,
  inFlight: 8,
};

export function createReplayLimiter(settings: ReplayLimitSettings) {
  const source = new RateLimiterMemory({ points: settings.perSource, duration: settings.windowSeconds });
  const address = new RateLimiterMemory({ points: settings.perAddress, duration: settings.windowSeconds });
  let running = 0;

  const consume = async (limiter: RateLimiterMemory, key: string) => {
    try {
      await limiter.consume(key);
    } catch (res) {
      if (res instanceof RateLimiterRes)
        throw rateLimited(
          res.msBeforeNext / 1000,
          'Too many replays from here; wait a moment and press again',
        );
      throw res;
    }
  };

  return {
    /** Counts one replay for both keys and runs it, or throws 429 with Retry-After. */
    async run<T>(sourceKey: string, ip: string, replay: () => Promise<T>): Promise<T> {
      await consume(source, sourceKey);
      await consume(address, ip);
      if (running >= settings.inFlight)
        throw rateLimited(2, 'The server is busy replaying; press again in a moment');
      running++;
      try {
        return await replay();
      } finally {
        running--;
      }
    },
  };
}
export type ReplayLimiter = ReturnType<typeof createReplayLimiter>;
