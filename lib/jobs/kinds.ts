/**
 * Every job kind the workers run, by name. A new kind is one
 * module implementing JobKind (lib/jobs/kind.ts) and one line here; see docs/jobs.md.
 */
import type { JobKind } from "./kind";
import { designSweepKind } from "./design-sweep-job";
import { runSearchKind } from "./run-search-job";
import { probabilisticKind } from "./probabilistic-job";

const KINDS = [designSweepKind, runSearchKind, probabilisticKind] as unknown as readonly JobKind<never, never>[];

export function jobKind(name: string): JobKind | null {
  return (KINDS.find((k) => k.kind === name) as unknown as JobKind | undefined) ?? null;
}
