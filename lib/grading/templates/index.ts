// The built-in, read-only limit profiles. Organisations clone one of these and tune it.
import type { Profile } from "../schema";
import { ieee8023Applications } from "./ieee";
import { isoIec11801 } from "./iso";
import { gpon, xgsPon } from "./pon";
import { tiaMultimode, tiaSinglemodeInsidePlant, tiaSinglemodeOutsidePlant } from "./tia";

export const templates: readonly Profile[] = deepFreeze([
  tiaMultimode,
  tiaSinglemodeInsidePlant,
  tiaSinglemodeOutsidePlant,
  isoIec11801,
  ieee8023Applications,
  gpon,
  xgsPon,
]);

export function findTemplate(slug: string): Profile | undefined {
  return templates.find((t) => t.slug === slug);
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object" && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}
