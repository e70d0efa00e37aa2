// Grading threads for large impact previews. On one thread, reading and decoding stored tests and grading
// them take turns; split into ranges, each worker thread streams, decodes and grades its own range on its
// own connection, and the engine runs on every core. The request's thread only merges the outcomes.
// Threads outlive a preview (idle ones end after a while), so the next preview skips their start-up and
// finds their engine code already compiled.
import { availableParallelism } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { Worker } from "node:worker_threads";
import type { PreviewStreamOptions } from "@/db/queries/verdict-stream";
import type { Profile } from "@/lib/grading/schema";
import type { FromWorker, ToWorker } from "./impact-worker";
import type { BatchOutcome } from "./regrade-batch";

/**
 * Threads for one preview: one per core, capped so that one preview cannot take a large server; none on a
 * single core, where a thread would only add the merging to the same core's work.
 */
export function defaultThreadCount(): number {
  const cores = availableParallelism();
  return cores < 2 ? 0 : Math.min(4, cores);
}

const IDLE_MS = 5 * 60_000;
const idle: { worker: Worker; timer: NodeJS.Timeout }[] = [];
let nextJobId = 1;

// A grading thread keeps counters and at most CHANGED_LINKS_CAP links, whatever the number of tests, so a
// small heap is plenty; the cap makes that a guarantee (a thread that held its tests would stop with an
// error rather than grow the server).
export const THREAD_HEAP_MB = 256;
const resourceLimits = { maxOldGenerationSizeMb: THREAD_HEAP_MB };

function spawn(): Worker {
  // Run from source (tests, scripts) this module is TypeScript: the thread registers tsx first, as the
  // scripts do. Built by Next, the module is JavaScript and the bundler follows the second form below,
  // bundling the worker with its imports; Reflect.construct keeps the first form out of its analysis.
  if (import.meta.url.endsWith(".ts")) {
    const source = path.join(path.dirname(fileURLToPath(import.meta.url)), "impact-worker.ts");
    return Reflect.construct(Worker, [`require("tsx/cjs"); require(${JSON.stringify(source)});`, { eval: true, resourceLimits }]) as Worker;
  }
  return new Worker(new URL("./impact-worker.ts", import.meta.url), { resourceLimits });
}

function acquire(): Worker {
  const kept = idle.pop();
  if (kept) {
    clearTimeout(kept.timer);
    kept.worker.ref();
    return kept.worker;
  }
  return spawn();
}

function release(worker: Worker) {
  if (idle.length >= defaultThreadCount()) {
    void worker.terminate();
    return;
  }
  // An idle thread must not keep the process alive, and ends on its own after a while.
  worker.unref();
  const timer = setTimeout(() => {
    const i = idle.findIndex((k) => k.worker === worker);
    if (i >= 0) idle.splice(i, 1);
    void worker.terminate();
  }, IDLE_MS);
  timer.unref();
  idle.push({ worker, timer });
}

/**
 * Runs one thread per range and yields each batch outcome as it arrives, tagged with its range. Outcomes
 * of one range arrive in that range's order. Returning early ends the threads still working.
 */
export async function* gradeRangesOnThreads(
  profile: Profile,
  ranges: PreviewStreamOptions[],
  keepChanged: number,
): AsyncGenerator<{ range: number; outcome: BatchOutcome }> {
  const queue: ({ range: number; outcome: BatchOutcome } | Error)[] = [];
  let wake: (() => void) | null = null;
  const push = (item: { range: number; outcome: BatchOutcome } | Error) => {
    queue.push(item);
    wake?.();
  };
  const lanes = ranges.map((range, i) => {
    const worker = acquire();
    const id = nextJobId++;
    const lane = {
      worker,
      finished: false,
      onMessage: (msg: FromWorker) => {
        if (msg.id !== id) return;
        if (msg.type === "batch") push({ range: i, outcome: msg.outcome });
        else if (msg.type === "done") {
          lane.finished = true;
          wake?.();
        } else push(new Error(`grading thread: ${msg.message}`));
      },
      onError: (err: Error) => push(err),
      onExit: (code: number) => push(new Error(`grading thread stopped (exit code ${code}) before its range was done`)),
    };
    worker.on("message", lane.onMessage).on("error", lane.onError).on("exit", lane.onExit);
    worker.postMessage({ type: "job", id, job: { profile, range, keepChanged } } satisfies ToWorker);
    return lane;
  });
  try {
    while (queue.length > 0 || lanes.some((l) => !l.finished)) {
      if (queue.length === 0) {
        await new Promise<void>((r) => (wake = r));
        wake = null;
        continue;
      }
      const item = queue.shift()!;
      if (item instanceof Error) throw item;
      yield item;
    }
  } finally {
    for (const lane of lanes) {
      lane.worker.off("message", lane.onMessage).off("error", lane.onError).off("exit", lane.onExit);
      // A thread that finished its range goes back to the idle set; one stopped midway is ended.
      if (lane.finished) release(lane.worker);
      else await lane.worker.terminate();
    }
  }
}
