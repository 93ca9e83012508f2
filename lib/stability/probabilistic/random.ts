/**
 * A seeded random stream that gives the same numbers on every machine: xoshiro128** (Blackman &
 * Vigna, "Scrambled linear pseudorandom number generators", 2018) on 32-bit integer arithmetic
 * only, seeded through splitmix32. Math.random is never used: it cannot be seeded.
 * The engine may import nothing but zod, hence this small generator instead of a package.
 */

/** A stream of uniform numbers strictly inside (0, 1), 53 bits each. */
export interface UniformStream {
  next(): number;
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}

/** Expands one 32-bit seed into the four state words (splitmix32 keeps seeds 0, 1, 2… apart). */
function seedState(seed: number): Uint32Array {
  const s = new Uint32Array(4);
  let state = seed >>> 0;
  for (let i = 0; i < 4; i++) {
    state = (state + 0x9e3779b9) | 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 16), 0x21f0aaad);
    z = Math.imul(z ^ (z >>> 15), 0x735a2d97);
    s[i] = (z ^ (z >>> 15)) >>> 0;
  }
  if ((s[0] | s[1] | s[2] | s[3]) === 0) s[0] = 1; // the all-zero state never leaves zero
  return s;
}

/** Creates the stream for a seed (an integer 0 … 2³² − 1). */
export function createStream(seed: number): UniformStream {
  const s = seedState(seed);
  let s0 = s[0] | 0;
  let s1 = s[1] | 0;
  let s2 = s[2] | 0;
  let s3 = s[3] | 0;
  const next32 = (): number => {
    const result = Math.imul(rotl(Math.imul(s1, 5), 7), 9) >>> 0;
    const t = s1 << 9;
    s2 ^= s0;
    s3 ^= s1;
    s1 ^= s2;
    s0 ^= s3;
    s2 ^= t;
    s3 = rotl(s3, 11);
    return result;
  };
  return {
    next(): number {
      const hi = next32() >>> 5; // 27 bits
      const lo = next32() >>> 6; // 26 bits
      // Half a step above zero so the inverse normal never sees 0 or 1.
      return (hi * 67108864 + lo + 0.5) / 9007199254740992;
    },
  };
}
