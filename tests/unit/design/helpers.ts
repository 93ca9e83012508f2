import { DEFAULT_PARAMS, type EmbankmentParams } from "@/lib/design";
import { DEMO_MATERIALS } from "@/db/seeds/demo-section";

/** The demo library as engine materials (db/seeds/demo-section.ts), invented values. */
export const MATERIALS = DEMO_MATERIALS;

export function params(overrides: Partial<EmbankmentParams> = {}): EmbankmentParams {
  return { ...DEFAULT_PARAMS, ...overrides };
}

export function assertInDelta(actual: number, expected: number, delta: number): void {
  if (!(Math.abs(actual - expected) <= delta))
    throw new Error(`expected ${actual} to be within ${delta} of ${expected}`);
}
