// Demo API data for Northmere Fibre: a sandbox key with a fixed secret (so the start command can print
// it) and about 80 gradings of invented links over the past 30 days, stored through the real chain
// storage so the console has verdicts to show. Idempotent: a second run adds nothing.
import { count, eq } from "drizzle-orm";
import type { Database } from "./index";
import { apiKeys, organisations, verdicts } from "./schema";
import { findTemplate, grade } from "@/lib/grading";
import type { LinkTest, Profile } from "@/lib/grading/schema";
import { displayStart, hashApiKey } from "@/lib/keys/api-key";
import { storeGradings } from "@/lib/verdicts/store";
import { seededRandom } from "@/lib/seeded-random";

// DEMO ONLY: a publicly known sandbox key for the demo organisation. It is written by the seed of a local
// demo database and nowhere else; never create it in a real installation.
export const DEMO_SANDBOX_KEY = "gg_sbx_NorthmereDemoKey00000000000000000000000000";
export const DEMO_DEFAULT_PROFILE = "tia-568-3-d-singlemode-osp";


const AREAS = ["BRACKENFOLD", "EASTMERE", "HAVERSTOKE", "TARNSIDE", "OWLCOTE", "SELDON-VALE"];
const round = (x: number, d = 2) => Math.round(x * 10 ** d) / 10 ** d;

/** Measured loss = budget - headroom, with headroom drawn so most links pass, some are marginal, some fail. */
function withLoss(test: LinkTest, profile: Profile, rand: () => number): LinkTest {
  const budgets = new Map(grade(test, profile).wavelengths.map((w) => [w.wavelengthNm, w.budgetDb]));
  const p = rand();
  const headroom = p < 0.72 ? 0.5 + rand() * 1.5 : p < 0.86 ? 0.03 + rand() * 0.12 : -(0.3 + rand() * 1.7);
  return {
    ...test,
    measurements: test.measurements.map((m, i) => ({
      ...m,
      insertionLossDb: round(Math.max(0, (budgets.get(m.wavelengthNm) ?? 3) - headroom - i * 0.05 * rand())),
    })),
  };
}

function ospLink(n: number, rand: () => number): LinkTest {
  const length = Math.round(800 + rand() * 8200);
  const splices = 1 + Math.floor(rand() * 6);
  const apc = rand() < 0.6;
  const measured = Math.round(length * (1 + (rand() - 0.5) * 0.004));
  const events: NonNullable<LinkTest["events"]> = [
    { wavelengthNm: 1310, positionM: 0, kind: "connector", lossDb: round(0.15 + rand() * 0.3), reflectanceDb: apc ? -62 : -52 },
  ];
  for (let s = 1; s <= splices; s++) {
    events.push({ wavelengthNm: 1310, positionM: Math.round((measured * s) / (splices + 1)), kind: "splice", lossDb: round(0.02 + rand() * 0.12) });
  }
  events.push({ wavelengthNm: 1310, positionM: measured, kind: "end", reflectanceDb: apc ? -60 : -50 });
  return {
    link: {
      ref: `NM-${AREAS[n % AREAS.length]}-${String(100 + n * 7).padStart(4, "0")}`,
      fibreType: "OS2",
      designLengthM: length,
      connectorPairs: 2,
      splices,
      polish: apc ? "APC" : "UPC",
    },
    measurements: [
      { wavelengthNm: 1310, direction: "AB", method: "one-cord", insertionLossDb: 0, orlDb: round(44 + rand() * 14, 1), lengthM: measured },
      { wavelengthNm: 1550, direction: "AB", method: "one-cord", insertionLossDb: 0, orlDb: round(46 + rand() * 14, 1), lengthM: measured },
    ],
    events,
  };
}

function ponLink(n: number, rand: () => number): LinkTest {
  const length = Math.round(2500 + rand() * 14000);
  return {
    link: {
      ref: `NM-PON-${AREAS[n % AREAS.length].slice(0, 4)}-${String(n + 1).padStart(3, "0")}`,
      fibreType: "G.652.D",
      designLengthM: length,
      connectorPairs: 3,
      splices: 3 + Math.floor(rand() * 8),
      splitters: [{ ratio: "1x32" }],
      polish: "APC",
      ponClass: "B+",
    },
    measurements: [
      { wavelengthNm: 1310, method: "one-cord", insertionLossDb: 0, lengthM: length },
      { wavelengthNm: 1490, method: "one-cord", insertionLossDb: 0, lengthM: length },
    ],
  };
}

function campusLink(n: number, rand: () => number): LinkTest {
  const length = Math.round(40 + rand() * 250);
  return {
    link: { ref: `NM-DEPOT-OM4-${String(n + 1).padStart(2, "0")}`, fibreType: "OM4", designLengthM: length, connectorPairs: 2, application: "10GBASE-SR" },
    measurements: [
      { wavelengthNm: 850, method: "one-cord", insertionLossDb: 0, lengthM: length },
      { wavelengthNm: 1300, method: "one-cord", insertionLossDb: 0, lengthM: length },
    ],
  };
}

export async function seedDemoApi(db: Database, organisationId: string, now = new Date()): Promise<{ sandboxKey: string; gradings: number; created: number }> {
  await db
    .insert(apiKeys)
    .values({
      organisationId,
      name: "Demo sandbox key (public, demo only)",
      environment: "sandbox",
      start: displayStart(DEMO_SANDBOX_KEY),
      hash: hashApiKey(DEMO_SANDBOX_KEY),
      scopes: ["grade", "verdicts:read", "profiles:read"],
    })
    .onConflictDoNothing({ target: apiKeys.hash });

  const [{ n }] = await db.select({ n: count() }).from(verdicts).where(eq(verdicts.organisationId, organisationId));
  if (n > 0) return { sandboxKey: DEMO_SANDBOX_KEY, gradings: n, created: 0 };

  await db.update(organisations).set({ defaultProfile: DEMO_DEFAULT_PROFILE }).where(eq(organisations.id, organisationId));
  const profiles = {
    osp: findTemplate("tia-568-3-d-singlemode-osp"),
    pon: findTemplate("itu-t-g984-2-gpon"),
    campus: findTemplate("tia-568-3-d-multimode"),
  };
  if (!profiles.osp || !profiles.pon || !profiles.campus) throw new Error("demo seed: a built-in template is missing");

  const rand = seededRandom(20261201);
  const plan: { test: LinkTest; profile: Profile }[] = [];
  for (let i = 0; i < 52; i++) plan.push({ test: ospLink(i, rand), profile: profiles.osp });
  for (let i = 0; i < 18; i++) plan.push({ test: ponLink(i, rand), profile: profiles.pon });
  for (let i = 0; i < 10; i++) plan.push({ test: campusLink(i, rand), profile: profiles.campus });

  // Spread over the last 30 days in working hours, oldest first so the chain follows time.
  const dayMs = 86_400_000;
  const items = plan
    .map((p) => {
      const day = Math.floor(rand() * 30);
      const at = new Date(now.getTime() - (day + 1) * dayMs);
      at.setUTCHours(7 + Math.floor(rand() * 10), Math.floor(rand() * 60), Math.floor(rand() * 60), 0);
      const test = withLoss(p.test, p.profile, rand);
      return { test, result: grade(test, p.profile), createdAt: at };
    })
    .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
  const stored = await storeGradings({ db, organisationId }, items);
  return { sandboxKey: DEMO_SANDBOX_KEY, gradings: stored.length, created: stored.length };
}
