/**
 * A finished sweep as a study keeps it (JSON), with the zod schema a browser-computed sweep must
 * fit. The server runs such a sweep again and keeps its own points (lib/design/keep-sweep.ts), so
 * only the shape and size are checked here.
 */
import { z } from "zod";
import { gridSchema, radiiSchema } from "@/lib/stability";
import type { SweepPoint } from "./run-job";
import { sweepSettingsSchema, type SweepCaseKey } from "./sweep-plan";
import type { RequiredFs } from "./pick-ratio";

const fs = z.number().positive().max(1000).nullable();

export const sweepPointSchema = z.object({
  id: z.string().max(80),
  phase: z.enum(["sweep", "recheck"]),
  face: z.enum(["upstream", "downstream"]),
  caseKey: z.enum(["steady-seepage", "drawdown-storage", "drawdown-surcharge"]),
  upstreamRatio: z.number().min(1).max(10),
  downstreamRatio: z.number().min(1).max(10),
  ratio: z.number().min(1).max(10),
  fsBishop: fs,
  fsOrdinary: fs,
  circle: z.object({ xc: z.number(), yc: z.number(), r: z.number().positive() }).nullable(),
  resolution: z.number().min(0).max(1000).nullable(),
  // Sweeps kept before the grid followed its minimum read as not moved and settled.
  gridMoves: z.number().int().min(0).max(100).default(0),
  gridEdge: z.boolean().default(false),
  grid: gridSchema.nullable(),
  radii: radiiSchema.nullable(),
  fillArea: z.number().min(0),
  warnings: z.array(z.string().max(1000)).max(50),
  error: z.string().max(2000).nullable(),
  elapsedMs: z.number().min(0),
}) satisfies z.ZodType<SweepPoint>;

export const storedSweepSchema = z.object({
  settings: sweepSettingsSchema,
  points: z.array(sweepPointSchema).min(1, "The sweep has no points.").max(500, "A sweep may have at most 500 points."),
  ranOn: z.enum(["browser", "server"]),
  /** Wall-clock time of the whole sweep (ms) and how many workers ran it. */
  elapsedMs: z.number().min(0),
  workers: z.number().int().min(1).max(64),
  engineVersion: z.string().max(40),
  finishedAt: z.string().max(40),
});

export type StoredSweep = z.infer<typeof storedSweepSchema>;

/** The required FS of each sweep case from the project's loading conditions (their keys coincide). */
export function requiredFsForSweep(map: Record<SweepCaseKey, number>): RequiredFs {
  return {
    "steady-seepage": map["steady-seepage"],
    "drawdown-storage": map["drawdown-storage"],
    "drawdown-surcharge": map["drawdown-surcharge"],
  };
}
