import { describe, expect, it } from "vitest";
import { InputError } from "@/lib/auth/errors";
import { InvalidInputError } from "@/lib/profiles/access";

describe("typed input refusals", () => {
  it("a single-field refusal carries one issue for that field", () => {
    const e = new InputError("That person is already a member.", "email");
    expect(e.issues).toEqual([{ path: "email", message: "That person is already a member." }]);
  });

  it("keeps every field of a multi-field refusal and can nest them under a body key", () => {
    const e = new InvalidInputError([
      { path: "spliceLossDb.value", message: "Must be 0 or more" },
      { path: "", message: "Whole-object problem" },
    ]);
    expect(e.issues).toHaveLength(2);
    expect(e.within("limits").issues).toEqual([
      { path: "limits.spliceLossDb.value", message: "Must be 0 or more" },
      { path: "limits", message: "Whole-object problem" },
    ]);
  });
});
