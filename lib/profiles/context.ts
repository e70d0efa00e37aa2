import type { Database } from "@/db";
import type { Actor } from "./access";

export interface ProfileContext {
  db: Database;
  actor: Actor;
  requestId?: string;
}
