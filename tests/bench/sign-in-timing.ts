/**
 * Bench: prints figures, asserts nothing on time. How long one password check takes for an account with a
 * password, an address without an account (the dummy hash), and an account without a password (magic-link only),
 * interleaved so that a load that comes and goes weighs on all three alike. Target: the three medians within a few
 * per cent of each other (the tests assert only that each path makes exactly one bcrypt comparison).
 *
 *   npx tsx --conditions react-server tests/bench/sign-in-timing.ts
 */
import { checkPassword, hashPassword } from "../../db/users";
import type { User } from "../../db/schema";

const ROUNDS = 25;

function account(passwordHash: string | null): User {
  const now = new Date();
  return { id: "00000000-0000-4000-8000-000000000001", email: "bench@example.test", name: "Bench", passwordHash, siteRole: "member", emailVerifiedAt: null, sessionVersion: 0, createdAt: now, updatedAt: now };
}

async function timed(run: () => Promise<unknown>): Promise<number> {
  const start = performance.now();
  await run();
  return performance.now() - start;
}

const quantile = (values: number[], q: number) => [...values].sort((a, b) => a - b)[Math.floor(q * (values.length - 1))];

async function main(): Promise<void> {
  const withPassword = account(await hashPassword("the owner's password"));
  const withoutPassword = account(null);
  const cases: [string, () => Promise<unknown>][] = [
    ["known address, wrong password", () => checkPassword(withPassword, "a guess")],
    ["unknown address (dummy hash)", () => checkPassword(undefined, "a guess")],
    ["account without a password", () => checkPassword(withoutPassword, "a guess")],
  ];
  await checkPassword(undefined, "warm-up: makes the dummy hash once");
  const times = new Map(cases.map(([name]) => [name, [] as number[]]));
  for (let round = 0; round < ROUNDS; round++) {
    for (const [name, run] of cases) times.get(name)!.push(await timed(run));
  }
  for (const [name, values] of times) {
    console.log(`${name.padEnd(32)} median ${quantile(values, 0.5).toFixed(1)} ms   p90 ${quantile(values, 0.9).toFixed(1)} ms   (${ROUNDS} checks)`);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
