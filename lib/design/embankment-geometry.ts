/**
 * The embankment's outline from its dimensions: faces with optional berms, the toe drain and,
 * for a zoned dam, the core. Reservoir on the left; x = 0 is the section's left edge, and the
 * section reaches `margin` beyond each toe so trial circles can exit in front of either toe.
 */
import type { Berm, EmbankmentParams } from "./parameters";

export type XY = [number, number];

export interface EmbankmentGeometry {
  height: number;
  margin: number;
  xmax: number;
  upstreamToe: XY;
  upstreamCrest: XY;
  downstreamCrest: XY;
  downstreamToe: XY;
  /** Upstream face from its toe up to the crest, x increasing. */
  upstreamFace: XY[];
  /** Downstream face from the crest down to its toe, x increasing. */
  downstreamFace: XY[];
  /** The whole embankment above the foundation (fill, drain and core together), counter-clockwise. */
  outline: XY[];
  drain: { start: XY; top: number; faceX: number; polygon: XY[] };
  core: { polygon: XY[]; upstreamBase: XY; downstreamBase: XY; upstreamTop: XY; downstreamTop: XY } | null;
}

/** Section margin beyond each toe (m): at least 20 m, or twice the height for taller dams. */
export function sectionMargin(height: number): number {
  return Math.ceil(Math.max(20, 2 * height));
}

/** Horizontal extent of a face of H:V slope n with an optional berm, from crest to toe (m). */
export function faceRun(height: number, slope: number, berm: Berm | null): number {
  return slope * height + (berm ? berm.width : 0);
}

/** A face's points from the crest edge outward and down to the toe; `sign` +1 runs right, −1 left. */
function faceFromCrest(crest: XY, foundationTop: number, slope: number, berm: Berm | null, sign: 1 | -1): XY[] {
  const pts: XY[] = [crest];
  let [x, y] = crest;
  if (berm) {
    x += sign * slope * (y - berm.elevation);
    y = berm.elevation;
    pts.push([x, y]);
    x += sign * berm.width;
    pts.push([x, y]);
  }
  x += sign * slope * (y - foundationTop);
  pts.push([x, foundationTop]);
  return pts;
}

/**
 * Geometry of the parametric embankment. The parameters are assumed valid
 * (embankmentParamsSchema); the toe drain's top meets the lowest stretch of the downstream face.
 */
export function embankmentGeometry(p: EmbankmentParams): EmbankmentGeometry {
  const ft = p.foundationTop;
  const height = p.crestElevation - ft;
  const margin = sectionMargin(height);
  const xUc = margin + faceRun(height, p.upstreamSlope, p.upstreamBerm);
  const upstreamCrest: XY = [xUc, p.crestElevation];
  const downstreamCrest: XY = [xUc + p.crestWidth, p.crestElevation];
  const upstreamFace = faceFromCrest(upstreamCrest, ft, p.upstreamSlope, p.upstreamBerm, -1).reverse();
  const downstreamFace = faceFromCrest(downstreamCrest, ft, p.downstreamSlope, p.downstreamBerm, 1);
  const upstreamToe = upstreamFace[0];
  const downstreamToe = downstreamFace[downstreamFace.length - 1];
  const xmax = downstreamToe[0] + margin;

  const drainTop = ft + p.drainThickness;
  const drainStart: XY = [downstreamToe[0] - p.drainLength, ft];
  const drainFaceX = downstreamToe[0] - p.downstreamSlope * p.drainThickness;
  const drainPolygon: XY[] = [drainStart, downstreamToe, [drainFaceX, drainTop], [drainStart[0], drainTop]];

  const outline: XY[] = [
    upstreamToe,
    downstreamToe,
    ...[...downstreamFace].reverse().slice(1),
    ...[...upstreamFace].reverse().slice(0, -1),
  ];

  let core: EmbankmentGeometry["core"] = null;
  if (p.zoning.kind === "zoned") {
    const xc = xUc + p.crestWidth / 2;
    const half = p.zoning.coreTopWidth / 2;
    const spread = p.zoning.coreSlope * height;
    const upstreamBase: XY = [xc - half - spread, ft];
    const downstreamBase: XY = [xc + half + spread, ft];
    const upstreamTop: XY = [xc - half, p.crestElevation];
    const downstreamTop: XY = [xc + half, p.crestElevation];
    core = {
      polygon: [upstreamBase, downstreamBase, downstreamTop, upstreamTop],
      upstreamBase,
      downstreamBase,
      upstreamTop,
      downstreamTop,
    };
  }

  return {
    height,
    margin,
    xmax,
    upstreamToe,
    upstreamCrest,
    downstreamCrest,
    downstreamToe,
    upstreamFace,
    downstreamFace,
    outline,
    drain: { start: drainStart, top: drainTop, faceX: drainFaceX, polygon: drainPolygon },
    core,
  };
}
