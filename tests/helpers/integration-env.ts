import { APP_URL, SMTP_PORT, TEST_DATABASE_URL } from "./test-env";

process.env.DATABASE_URL = TEST_DATABASE_URL;
// Mail from lib code under test goes to the fake receiver started by global-smtp.ts.
process.env.EMAIL_SERVER = `smtp://127.0.0.1:${SMTP_PORT}`;
process.env.NEXTAUTH_URL ??= APP_URL;
