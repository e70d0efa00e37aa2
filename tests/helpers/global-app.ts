// For e2e: serve the built app (`next build` must have run, see scripts/test.sh) on the test port.
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { APP_PORT, APP_URL, SMTP_PORT, TEST_DATABASE_URL } from "./test-env";

const ROOT = path.resolve(import.meta.dirname, "../..");

async function waitFor(url: string, timeoutMs: number) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      const res = await fetch(url);
      if (res.status < 500) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`app did not answer at ${url} within ${timeoutMs} ms`);
}

export default async function setup() {
  let server: ChildProcess | undefined;
  if (!process.env.APP_URL) {
    server = spawn(process.execPath, [path.join(ROOT, "node_modules/next/dist/bin/next"), "start", "-p", String(APP_PORT), "-H", "127.0.0.1"], {
      cwd: ROOT,
      env: {
        ...process.env,
        DATABASE_URL: TEST_DATABASE_URL,
        NEXTAUTH_URL: APP_URL,
        NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET ?? "test-secret-not-for-production",
        NEXT_TELEMETRY_DISABLED: "1",
        EMAIL_SERVER: `smtp://127.0.0.1:${SMTP_PORT}`,
        DEV_MAILBOX: "1",
        // Every impact preview on grading threads, so the bundled worker is what the e2e tests exercise.
        GLASSGRADE_PREVIEW_THREADS_FROM: "1",
      },
      stdio: ["ignore", "inherit", "inherit"],
    });
  }
  await waitFor(`${APP_URL}/api/v1/health`, 60_000);
  return async () => {
    if (server && server.exitCode === null) {
      server.kill("SIGTERM");
      await new Promise((r) => server!.once("exit", r));
    }
  };
}
