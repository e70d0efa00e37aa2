// The draft editor's schema: the engine's LimitsSchema plus checks that only make sense for a whole
// table (a wavelength the fibre type cannot carry, the same row twice). Shared by the form (client) and
// the server actions, so a message shows on the field it concerns either way.
import { z } from "zod";
import { LimitsSchema, wavelengthsFor, type FibreType } from "@/lib/grading/schema";

function checkWavelengths(
  rows: { fibreTypes: FibreType[]; wavelengthNm: number }[],
  table: string,
  ctx: z.RefinementCtx,
) {
  rows.forEach((row, i) => {
    const unsupported = row.fibreTypes.filter((f) => !wavelengthsFor(f).includes(row.wavelengthNm));
    if (unsupported.length) {
      ctx.addIssue({
        code: "custom",
        path: [table, i, "wavelengthNm"],
        message: `${row.wavelengthNm} nm is not a wavelength ${unsupported.join(", ")} fibre carries (allowed: ${wavelengthsFor(unsupported[0]).join(", ")})`,
      });
    }
  });
}

export const DraftLimitsSchema = LimitsSchema.superRefine((limits, ctx) => {
  checkWavelengths(limits.attenuation, "attenuation", ctx);
  checkWavelengths(limits.applications, "applications", ctx);
  const seen = new Map<string, number>();
  limits.attenuation.forEach((row, i) => {
    for (const f of row.fibreTypes) {
      const key = `${f}@${row.wavelengthNm}`;
      if (seen.has(key)) {
        ctx.addIssue({ code: "custom", path: ["attenuation", i, "fibreTypes"], message: `${f} at ${row.wavelengthNm} nm is already in row ${seen.get(key)! + 1}` });
      } else seen.set(key, i);
    }
  });
  const classes = new Set<string>();
  limits.ponClasses.forEach((row, i) => {
    if (classes.has(row.ponClass)) ctx.addIssue({ code: "custom", path: ["ponClasses", i, "ponClass"], message: `Class ${row.ponClass} is listed twice` });
    classes.add(row.ponClass);
  });
  if (limits.defaultPonClass && !classes.has(limits.defaultPonClass)) {
    ctx.addIssue({ code: "custom", path: ["defaultPonClass"], message: `${limits.defaultPonClass} is not one of the PON classes below` });
  }
});
export type DraftLimits = z.infer<typeof DraftLimitsSchema>;
