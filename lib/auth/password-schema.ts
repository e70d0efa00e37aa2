import { z } from "zod";

// Length is what makes a password strong; no composition rules (NIST SP 800-63B, section 5.1.1.2).
export const passwordSchema = z.string().min(12, "Use at least 12 characters.").max(200, "Use at most 200 characters.");
