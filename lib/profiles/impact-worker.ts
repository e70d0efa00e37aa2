// A grading thread of large impact previews (see preview-threads.ts). It lives across previews: each job
// names a range of stored tests, which the thread streams from PostgreSQL on its own connection,
// re-grades, and answers with one outcome per batch, then "done".
import { parentPort } from "node:worker_threads";
import { getDb } from "@/db";
import type { PreviewStreamOptions } from "@/db/queries/verdict-stream";
import type { Profile } from "@/lib/grading/schema";
import { regradeRange, type BatchOutcome } from "./regrade-batch";

export interface RangeJob {
  profile: Profile;
  range: PreviewStreamOptions;
  keepChanged: number;
}

export type ToWorker = { type: "job"; id: number; job: RangeJob };
export type FromWorker = { type: "batch"; id: number; outcome: BatchOutcome } | { type: "done"; id: number } | { type: "error"; id: number; message: string };

const post = (msg: FromWorker) => parentPort?.postMessage(msg);

parentPort?.on("message", async (msg: ToWorker) => {
  if (msg.type !== "job") return;
  const { id, job } = msg;
  try {
    for await (const outcome of regradeRange(getDb(), job.range, job.profile, job.keepChanged)) post({ type: "batch", id, outcome });
    post({ type: "done", id });
  } catch (err) {
    post({ type: "error", id, message: err instanceof Error ? err.message : String(err) });
  }
});
