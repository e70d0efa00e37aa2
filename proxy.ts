// Next.js 16 request proxy: keeps /console for signed-in users. It only checks that a session exists;
// roles are checked on the server by every page, action and route (lib/auth/session.ts).
import { withAuth } from "next-auth/middleware";
import { NextResponse } from "next/server";

export default withAuth(
  function proxy(req) {
    // Pages read this to send people back where they were after signing in again.
    const headers = new Headers(req.headers);
    headers.set("x-glassgrade-path", req.nextUrl.pathname + req.nextUrl.search);
    return NextResponse.next({ request: { headers } });
  },
  {
    callbacks: { authorized: ({ token }) => !!token?.userId },
    pages: { signIn: "/sign-in" },
  },
);

export const config = { matcher: ["/console", "/console/:path*"] };
