// Development and test mail receiver: accepts any message on 127.0.0.1:$SMTP_PORT (default 2525) and stores
// it in the dev_mailbox table, where the console's mailbox page and the tests read it. Never for production.
import { Pool } from "pg";
import { SMTPServer } from "smtp-server";
import { parseMail } from "../lib/mail/parse";

const MAX_BYTES = 1_000_000;

export interface DevSmtp {
  port: number;
  close(): Promise<void>;
}

export async function startDevSmtp(opts: { port: number; databaseUrl: string; host?: string }): Promise<DevSmtp> {
  const pool = new Pool({ connectionString: opts.databaseUrl, max: 2 });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    size: MAX_BYTES,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", async () => {
        try {
          const mail = parseMail(Buffer.concat(chunks).toString("utf8"));
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address).join(", ");
          const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
          await pool.query("insert into dev_mailbox (from_address, to_address, subject, body) values ($1, $2, $3, $4)", [
            mail.from || envelopeFrom,
            envelopeTo || mail.to,
            mail.subject,
            mail.body,
          ]);
          callback();
        } catch (err) {
          callback(err as Error);
        }
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, opts.host ?? "127.0.0.1", () => resolve());
  });
  return {
    port: opts.port,
    async close() {
      await new Promise<void>((r) => server.close(() => r()));
      await pool.end();
    },
  };
}

if (process.argv[1] && /dev-smtp\.ts$/.test(process.argv[1])) {
  const port = Number(process.env.SMTP_PORT ?? 2525);
  const databaseUrl = process.env.DATABASE_URL ?? "postgres://postgres@127.0.0.1:54329/glassgrade";
  startDevSmtp({ port, databaseUrl })
    .then(() => console.log(`[dev-smtp] receiving mail on 127.0.0.1:${port}`))
    .catch((err) => {
      console.error("[dev-smtp] failed to start:", err);
      process.exit(1);
    });
}
