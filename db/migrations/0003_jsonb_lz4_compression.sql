-- Large JSON documents (stored test inputs and graded results) are compressed with lz4 rather than the
-- default pglz: several times cheaper to write, which matters for 1,000-test batches. Debian builds
-- PostgreSQL with lz4. Existing rows keep their compression until rewritten; only new values use lz4.
ALTER TABLE "verdicts" ALTER COLUMN "result" SET COMPRESSION lz4;--> statement-breakpoint
ALTER TABLE "tests" ALTER COLUMN "input" SET COMPRESSION lz4;
