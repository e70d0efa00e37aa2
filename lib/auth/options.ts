import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { signInLimiter } from "./attempts";
import { findUserByEmail, resolveMember } from "./memberships";
import { verifyPassword } from "./password";
import { signInSchema } from "./sign-in-schema";

export const SIGN_IN_PATH = "/sign-in";

// JWT sessions carry who signed in and the organisation and role at sign-in. The console re-reads the
// membership from the database on every request (lib/auth/session.ts), so a role change or removal
// takes effect at once rather than when the token expires.
export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  pages: { signIn: SIGN_IN_PATH, error: SIGN_IN_PATH },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw) {
        const parsed = signInSchema.safeParse(raw);
        if (!parsed.success) return null;
        const key = parsed.data.email.trim().toLowerCase();
        if (signInLimiter.isBlocked(key)) return null;
        const user = await findUserByEmail(parsed.data.email);
        const ok = await verifyPassword(parsed.data.password, user?.passwordHash);
        if (!user || !ok) {
          signInLimiter.fail(key);
          return null;
        }
        signInLimiter.succeed(key);
        const member = await resolveMember(user.id);
        if (!member) return null; // a user without any organisation has nothing to see
        return {
          id: user.id,
          email: user.email,
          name: user.name,
          organisationId: member.organisationId,
          role: member.role,
        };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.userId = user.id;
        token.organisationId = user.organisationId;
        token.role = user.role;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        session.user.id = token.userId;
        session.user.organisationId = token.organisationId;
        session.user.role = token.role;
      }
      return session;
    },
  },
};
