// For integration and e2e: the fake SMTP receiver on $TEST_SMTP_PORT, storing mail in the test database.
import { SMTP_PORT, TEST_DATABASE_URL } from "./test-env";

const marker = "__glassgradeTestSmtp";

export default async function setup() {
  const g = globalThis as Record<string, unknown>;
  if (g[marker]) return;
  const { startDevSmtp } = await import("../../scripts/dev-smtp");
  const smtp = await startDevSmtp({ port: SMTP_PORT, databaseUrl: TEST_DATABASE_URL });
  g[marker] = smtp;
  return async () => {
    g[marker] = undefined;
    await smtp.close();
  };
}
