// Names shared by the test harness. Each parallel run can pick its own database and ports through env.
export const TEST_DB_NAME = process.env.TEST_DB_NAME ?? "glassgrade_test";
export const PG_PORT = Number(process.env.GLASSGRADE_PG_PORT ?? 54329);
export const TEST_DATABASE_URL = `postgres://postgres@127.0.0.1:${PG_PORT}/${TEST_DB_NAME}`;
export const APP_PORT = Number(process.env.TEST_APP_PORT ?? 3100);
export const SMTP_PORT = Number(process.env.TEST_SMTP_PORT ?? 2626);
// Not BASE_URL: Vite sets that one to "/".
export const APP_URL = process.env.APP_URL ?? `http://127.0.0.1:${APP_PORT}`;
