import fc from "fast-check";

// Local runs explore new random cases each time; CI replays one fixed seed, so a property that a
// rare draw breaks is found by a developer, not by a submission that then cannot land.
if (process.env.CI) fc.configureGlobal({ seed: Number(process.env.FAST_CHECK_SEED ?? 20261202) });
