// Wire shapes shared by several routes. One zod schema per shape: it validates, types and documents.
import { z } from "zod";
import { PROBLEMS } from "@/lib/api/problem";

export const ProfileRefSchema = z
  .string()
  .trim()
  .regex(/^[a-z0-9](?:[a-z0-9-]*[a-z0-9])?(?:@[1-9][0-9]{0,8})?$/, "profile must be a slug such as tia-568-3-d-singlemode-osp, optionally with @version")
  .max(90)
  .meta({
    description: "A template slug or one of your organisation's profile slugs, optionally pinned to a version with `@n`.",
    example: "tia-568-3-d-singlemode-osp",
  });

export const ProblemSchema = z
  .object({
    type: z.string().meta({ example: "https://glassgrade.dev/problems/validation-failed" }),
    title: z.string().meta({ example: "Request failed validation" }),
    status: z.number().int().meta({ example: 422 }),
    detail: z.string().meta({ example: "1 field is invalid." }),
    instance: z.string().optional().meta({ example: "/api/v1/gradings" }),
    code: z.enum(Object.keys(PROBLEMS) as [keyof typeof PROBLEMS, ...(keyof typeof PROBLEMS)[]]),
    requestId: z.string().optional().meta({ example: "req_3vJ0cW1lX9mQ2aTb" }),
    errors: z
      .array(
        z.object({
          pointer: z.string().meta({ description: "JSON pointer (RFC 6901) of the offending field", example: "/test/link/fibreType" }),
          message: z.string().meta({ example: "Invalid option: expected one of \"OM1\"|\"OM2\"|…" }),
        }),
      )
      .optional()
      .meta({ description: "One entry per invalid field (422 only)" }),
  })
  .meta({ description: "RFC 9457 problem details, with a stable `code` and the request id" });

export const CursorSchema = z.string().max(200).meta({ description: "Opaque cursor from `nextCursor` of the previous page" });
