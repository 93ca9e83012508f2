/**
 * Closed-form factor of safety of an infinite slope (plane slip parallel to the surface),
 * the limit that shallow circles on a long uniform slope approach from above. Used as a
 * check of the circular engine and for quick hand estimates.
 * Reference: e.g. Duncan, Wright & Brandon (2014), Soil Strength and Slope Stability, ch. 6.
 * Units: kPa, kN/m³, m, degrees.
 */

/** Inputs: slope β (°), vertical depth z of the slip plane (m), unit weight γ (kN/m³). */
export interface InfiniteSlopeInput {
  beta: number;
  z: number;
  gamma: number;
  c?: number;
  phi?: number;
  /** Height of the water table above the slip plane as a fraction m of z, seepage parallel to the slope. */
  m?: number;
  /** Pore-pressure ratio (instead of m). */
  ru?: number;
  gammaW?: number;
}

const rad = (d: number) => (d * Math.PI) / 180;

/**
 * FS = [c' + (γz·cos²β − u)·tan φ'] / (γz·sin β·cos β), with u = γw·m·z·cos²β for seepage
 * parallel to the slope, or u = ru·γz.
 */
export function infiniteSlopeFactor(i: InfiniteSlopeInput): number {
  const b = rad(i.beta);
  const cos2 = Math.cos(b) ** 2;
  const sig = i.gamma * i.z;
  const u = i.ru !== undefined ? i.ru * sig : (i.gammaW ?? 9.81) * (i.m ?? 0) * i.z * cos2;
  return ((i.c ?? 0) + (sig * cos2 - u) * Math.tan(rad(i.phi ?? 0))) / (sig * Math.sin(b) * Math.cos(b));
}

/** Undrained infinite slope: FS = 2·su / (γz·sin 2β). */
export function infiniteSlopeUndrained(su: number, gamma: number, z: number, beta: number): number {
  return (2 * su) / (gamma * z * Math.sin(2 * rad(beta)));
}
