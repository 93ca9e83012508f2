/** Invented slices and a small section for the run-view tests; no real site. */
import type { SliceRow } from "@/lib/stability";

export function slice(over: Partial<SliceRow> = {}): SliceRow {
  return {
    xLeft: 10,
    xRight: 11,
    weight: 120.5,
    pondedLoad: 0,
    waterThrust: 0,
    surcharge: 0,
    seismicForce: 0,
    alpha: 25.3,
    baseLength: 1.1,
    baseY: 4.2,
    porePressure: 18.4,
    material: "fill",
    c: 8,
    phi: 28,
    driving: 51.5,
    mAlpha: 1.02,
    normalBishop: 98.1,
    resistingBishop: 61.2,
    normalOrdinary: 91.4,
    resistingOrdinary: 57.4,
    ...over,
  };
}

export const SLICES: SliceRow[] = [
  slice({ xLeft: 10, xRight: 11, alpha: 48.2, weight: 20.1, mAlpha: 0.91 }),
  slice({ xLeft: 11, xRight: 12, alpha: 30.5, weight: 60.7, mAlpha: null, normalBishop: null, resistingBishop: null }),
  slice({
    xLeft: 12,
    xRight: 13,
    alpha: -12.4,
    weight: 35.2,
    mAlpha: 0.15,
    driving: -7.5,
    material: "=cmd|' /C calc'!A0",
  }),
];
