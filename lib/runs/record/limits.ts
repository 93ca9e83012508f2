/**
 * How large a search the server runs when it keeps a run. A save re-runs the whole search on
 * the server (lib/runs/record/save-run.ts), so its size is bounded: 250,000 trial circles is far past
 * what a careful search of one section needs (the default set-up tries a few thousand) and keeps
 * one save to a few seconds of one core.
 */
export const MAX_SEARCH_CIRCLES = 250_000;

/** Trial circles of the coarse grid: centres × radii (refinement adds a bounded few hundred). */
export function searchCircleCount(grid: { nx: number; ny: number }, radii: { n: number }): number {
  return grid.nx * grid.ny * radii.n;
}

/** The refusal of a set-up over the limit, naming both numbers. */
export function tooManyCirclesMessage(count: number): string {
  return (
    `This set-up tries ${count.toLocaleString("en-GB")} circles; a kept run may try at most ` +
    `${MAX_SEARCH_CIRCLES.toLocaleString("en-GB")}. Use fewer centres or radii.`
  );
}

/**
 * Past this many trial circles a kept run's search goes to the job queue (lib/jobs/run-search-job.ts)
 * instead of running within the save request. The default set-up tries a few thousand circles and
 * stays in the request (the answer is the kept run at once); 50,000 is ten times a careful set-up,
 * where one search starts to hold a core for seconds, long for a request and for the web process.
 */
export const QUEUE_SEARCH_CIRCLES = 50_000;
