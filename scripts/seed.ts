/**
 * Demo data, idempotent: three accounts and one demo plan for the member, set in a garage of our
 * own invention. Running it again changes nothing that exists.
 */
import { MikroORM } from "@mikro-orm/postgresql";
import config from "../mikro-orm.config";
import { UserSchema } from "../entities/User";
import { PlanSchema } from "../entities/Plan";
import { hashPassword } from "../lib/server/passwords";
import { demoPlan } from "../lib/engine/demo/demo-plan";
import { parsePlan } from "../lib/engine/plan/parse";

import { DEMO_ACCOUNTS as ACCOUNTS, DEMO_PASSWORD, demoBanner } from "./demo-accounts";

async function main() {
  const orm = await MikroORM.init({ ...config, clientUrl: process.env.DATABASE_URL ?? config.clientUrl });
  const em = orm.em.fork();
  const hash = await hashPassword(DEMO_PASSWORD);
  for (const a of ACCOUNTS) {
    const found = await em.findOne(UserSchema, { email: a.email });
    if (!found) em.create(UserSchema, { ...a, passwordHash: hash, emailVerifiedAt: new Date() });
  }
  await em.flush();
  const robin = await em.findOneOrFail(UserSchema, { email: ACCOUNTS[0].email });
  if (!(await em.count(PlanSchema, { owner: robin.id, name: "Two-car garage shop" }))) {
    const parsed = parsePlan(demoPlan());
    if (!parsed.ok) throw new Error(`the demo plan does not validate: ${JSON.stringify(parsed.issues)}`);
    const document = parsed.plan;
    em.create(PlanSchema, { owner: robin, name: "Two-car garage shop", units: document.settings.units, document: document as unknown as Record<string, unknown>, version: 1 });
    await em.flush();
  }
  await orm.close();
  // The only line on stdout: scripts/start.sh shows it in its banner.
  console.log(demoBanner());
}

main().catch((e) => {
  console.error("seeding failed:", e);
  process.exit(1);
});
