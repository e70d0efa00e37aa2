import type { Role } from "@/db/schema";
import "next-auth";
import "next-auth/jwt";

// What our credentials provider adds to next-auth's user, session and token. Optional on User so that
// next-auth's own adapter types still fit.
declare module "next-auth" {
  interface User {
    organisationId?: string;
    role?: Role;
  }
  interface Session {
    user?: { id?: string; name?: string | null; email?: string | null; organisationId?: string; role?: Role };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    userId?: string;
    organisationId?: string;
    role?: Role;
  }
}
