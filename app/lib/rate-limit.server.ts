// How many sign-in codes may be asked for, per address and per client address. The counters live in
// PostgreSQL (rate-limiter-flexible's Postgres store), so every app instance shares them.
import { createHash } from "node:crypto";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { db } from "./db.server.ts";
import { env } from "./env.server.ts";

export type Allowance = { ok: true } | { ok: false; scope: "address" | "client"; retryAfterSeconds: number };

let limiters: { address: RateLimiterPostgres; client: RateLimiterPostgres } | undefined;

function limiter(keyPrefix: string, points: number): RateLimiterPostgres {
  return new RateLimiterPostgres({
    storeClient: db().sequelize,
    storeType: "sequelize",
    tableName: "rate_limits",
    // The table comes from a migration; expired rows are overwritten in place by the next request.
    tableCreated: true,
    clearExpiredByTimeout: false,
    keyPrefix,
    points,
    duration: env().SIGN_IN_CODE_WINDOW_SECONDS,
  });
}

function signInLimiters() {
  limiters ??= {
    address: limiter("sign-in-address", env().SIGN_IN_CODES_PER_ADDRESS),
    client: limiter("sign-in-client", env().SIGN_IN_CODES_PER_CLIENT),
  };
  return limiters;
}

// Keys are hashed: an address can be 254 characters long, the store's key column 255 with its prefix.
function keyOf(value: string): string {
  return createHash("sha256").update(value).digest("hex");
}

async function take(limiter: RateLimiterPostgres, key: string, scope: "address" | "client"): Promise<Allowance> {
  try {
    await limiter.consume(keyOf(key));
    return { ok: true };
  } catch (outcome) {
    if (outcome instanceof RateLimiterRes) return { ok: false, scope, retryAfterSeconds: Math.max(1, Math.ceil(outcome.msBeforeNext / 1000)) };
    throw outcome;
  }
}

/** Takes one code from the client's allowance, then from the address's; the first refusal wins. */
export async function takeSignInCodeAllowance(input: { email: string; clientAddress: string }): Promise<Allowance> {
  const { address, client } = signInLimiters();
  const byClient = await take(client, input.clientAddress, "client");
  if (!byClient.ok) return byClient;
  return take(address, input.email, "address");
}
