/**
 * The sensitivity section of a run's PDF, computed on the server with its own searches (the
 * engine threads, as a kept run is searched), never taken from the browser.
 */
import { z } from "zod";
import type { Method, SectionDocument } from "@/lib/stability";
import { searchOnServer } from "@/lib/runs/record/server-search";
import type { ReportSensitivity } from "@/lib/report/sensitivity-section";
import { inputParameters } from "./parameters";
import { tornadoStudy } from "./study";
import type { Variation } from "./sensitivity";

/** `?sensitivity=10` (per cent of each value, 1–50) or `?sensitivity=sd` (one standard deviation). */
export const sensitivityQuerySchema = z.union([
  z.literal("sd"),
  z.coerce
    .number({ error: "sensitivity: give a percentage from 1 to 50, or sd." })
    .min(1, "sensitivity: at least 1 %.")
    .max(50, "sensitivity: at most 50 %."),
]);

export function variationOf(q: z.infer<typeof sensitivityQuerySchema>): Variation {
  return q === "sd" ? { kind: "sd" } : { kind: "percent", percent: q };
}

export async function reportSensitivity(
  doc: SectionDocument,
  method: Method,
  baseFs: number,
  variation: Variation,
): Promise<ReportSensitivity> {
  const fsOf = async (d: SectionDocument) => {
    const { record } = await searchOnServer(d);
    return record.ok ? (record.result.results[method]?.fs ?? null) : null;
  };
  const bars = await tornadoStudy(doc, inputParameters(doc), variation, fsOf);
  return {
    variation: variation.kind === "sd" ? "one standard deviation" : `±${variation.percent} % of each value`,
    method: method === "bishop" ? "Bishop's simplified method" : "ordinary method of slices",
    baseFs,
    bars,
  };
}
