/**
 * What the browser computed is a preview; the server's own search is what a run keeps. This
 * compares the two and lists where they differ beyond FS_TOLERANCE, so the answer to a save and
 * the run page can say so. Pure: no engine calls here.
 */
import { z } from "zod";
import type { CircleFs, FsMap, GridSearchSuccess, Method } from "@/lib/stability";
import type { StoredSearchResult } from "./result-schema";
import { countOf } from "@/lib/format";

/** Relative agreement required; the engine is deterministic, so anything beyond float noise is a difference. */
const FS_TOLERANCE = 1e-6;
/** Stands for a value one side has and the other lacks. */
export const MISSING = "none";
/** Differences listed one by one; the rest are counted. */
const MAX_LISTED = 20;

const previewDifferenceSchema = z.object({
  field: z.string().max(200),
  sent: z.string().max(200),
  server: z.string().max(200),
});

export const previewCheckSchema = z.object({
  /** matched: the preview equals the server's search; differed: it does not; absent: none was sent. */
  status: z.enum(["matched", "differed", "absent"]),
  /** Where the preview came from: the browser's search, or a design sweep's kept point. */
  source: z.enum(["browser", "sweep"]),
  differences: z.array(previewDifferenceSchema).max(MAX_LISTED),
  /** Differences found beyond those listed. */
  more: z.number().int().nonnegative(),
});

export type PreviewDifference = z.infer<typeof previewDifferenceSchema>;
export type PreviewCheck = z.infer<typeof previewCheckSchema>;

export function sameNumber(a: number | null | undefined, b: number | null | undefined): boolean {
  if (a === null || a === undefined || b === null || b === undefined) return (a ?? null) === (b ?? null);
  return Math.abs(a - b) <= FS_TOLERANCE * Math.max(1, Math.abs(a), Math.abs(b));
}

const show = (v: number | null | undefined) => (v === null || v === undefined ? MISSING : String(v));

/** Collects differences, listing the first MAX_LISTED. */
export class DifferenceList {
  readonly listed: PreviewDifference[] = [];
  more = 0;
  add(field: string, sent: string, server: string): void {
    if (this.listed.length < MAX_LISTED)
      this.listed.push({ field, sent: sent.slice(0, 200), server: server.slice(0, 200) });
    else this.more++;
  }
  number(field: string, sent: number | null | undefined, server: number | null | undefined): void {
    if (!sameNumber(sent, server)) this.add(field, show(sent), show(server));
  }
  check(source: PreviewCheck["source"]): PreviewCheck {
    const differed = this.listed.length > 0 || this.more > 0;
    return { status: differed ? "differed" : "matched", source, differences: this.listed, more: this.more };
  }
}

type SentCircle = StoredSearchResult["results"]["bishop"];

function compareCircle(d: DifferenceList, field: string, sent: SentCircle, server: CircleFs | null | undefined) {
  if (!sent || !server) {
    if (!sent !== !server) d.add(field, sent ? `FS ${sent.fs}` : MISSING, server ? `FS ${server.fs}` : MISSING);
    return;
  }
  d.number(`${field}.fs`, sent.fs, server.fs);
  d.number(`${field}.circle.xc`, sent.circle.xc, server.circle.xc);
  d.number(`${field}.circle.yc`, sent.circle.yc, server.circle.yc);
  d.number(`${field}.circle.r`, sent.circle.r, server.circle.r);
}

function compareMap(d: DifferenceList, field: string, sent: FsMap | undefined, server: FsMap | undefined) {
  if (!sent || !server) {
    if (!sent !== !server) d.add(field, sent ? "a map" : MISSING, server ? "a map" : MISSING);
    return;
  }
  if (sent.nx !== server.nx || sent.ny !== server.ny || sent.values.length !== server.values.length) {
    d.add(`${field}.size`, `${sent.nx} × ${sent.ny}`, `${server.nx} × ${server.ny}`);
    return;
  }
  let cells = 0;
  let first = -1;
  server.values.forEach((v, i) => {
    if (!sameNumber(sent.values[i], v)) {
      cells++;
      if (first < 0) first = i;
    }
  });
  if (cells > 0)
    d.add(`${field}.values`, `${countOf(cells, "cell")} differ, first at ${first}`, show(server.values[first]));
}

function compareLowest(d: DifferenceList, field: string, sent: SentCircle[] | undefined, server: CircleFs[] = []) {
  const s = sent ?? [];
  if (s.length !== server.length) d.add(`${field}.length`, String(s.length), String(server.length));
  for (let i = 0; i < Math.min(s.length, server.length); i++) d.number(`${field}[${i}].fs`, s[i]!.fs, server[i].fs);
}

function warningKeys(ws: readonly { code: string; message: string }[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const w of ws) out.set(`${w.code}: ${w.message}`, (out.get(`${w.code}: ${w.message}`) ?? 0) + 1);
  return out;
}

/** Where the browser's preview of a search differs from the server's; "absent" when none was sent. */
export function comparePreview(server: GridSearchSuccess, sent: StoredSearchResult | undefined): PreviewCheck {
  const d = new DifferenceList();
  if (!sent) return { status: "absent", source: "browser", differences: [], more: 0 };
  if (sent.engineVersion !== server.engineVersion) d.add("engineVersion", sent.engineVersion, server.engineVersion);
  const methods = new Set<Method>([...server.methods, ...sent.methods]);
  for (const m of methods) {
    compareCircle(d, `results.${m}`, sent.results[m], server.results[m]);
    compareMap(d, `fsMap.${m}`, sent.fsMap[m], server.fsMap[m]);
    compareLowest(d, `lowest.${m}`, sent.lowest[m], server.lowest[m]);
  }
  d.number("circles.tried", sent.circles.tried, server.circles.tried);
  d.number("circles.valid", sent.circles.valid, server.circles.valid);
  const reasons = new Set([...Object.keys(sent.circles.rejected), ...Object.keys(server.circles.rejected)]);
  for (const r of reasons)
    d.number(`circles.rejected.${r}`, sent.circles.rejected[r] ?? 0, server.circles.rejected[r] ?? 0);
  const sw = warningKeys(sent.warnings);
  const vw = warningKeys(server.warnings);
  for (const [k, n] of vw) if ((sw.get(k) ?? 0) !== n) d.add("warnings", (sw.get(k) ?? 0) > 0 ? k : MISSING, k);
  for (const [k] of sw) if (!vw.has(k)) d.add("warnings", k, MISSING);
  return d.check("browser");
}

/** The comparison stored with a kept run, or null for a run kept before the server searched on save. */
export function readPreviewCheck(result: unknown): PreviewCheck | null {
  const raw = (result as { previewCheck?: unknown } | null)?.previewCheck;
  const parsed = previewCheckSchema.safeParse(raw);
  return parsed.success ? parsed.data : null;
}

const FIELD_WORDS: [RegExp, string][] = [
  [/^results\.bishop\.fs$/, "Bishop's FS"],
  [/^results\.fellenius\.fs$/, "Ordinary-method FS"],
  [/^results\.(\w+)\.circle\.(xc|yc|r)$/, "critical circle ($2)"],
  [/^results\.(\w+)$/, "critical circle"],
  [/^fsMap\./, "FS map"],
  [/^lowest\./, "lowest circles"],
  [/^circles\./, "circle counts"],
  [/^warnings$/, "warnings"],
  [/^engineVersion$/, "engine version"],
  [/^points\./, "sweep point"],
];

/** A difference's field in words for the notice. */
export function differenceWords(field: string): string {
  for (const [re, words] of FIELD_WORDS) if (re.test(field)) return field.replace(re, words);
  return field;
}

/**
 * A difference as one line for the notice. Numbers far apart are shown to 4 decimals (as the FS is
 * everywhere else); numbers that differ only beyond that keep 10 significant digits so the
 * difference shows.
 */
export function differenceLine(d: PreviewDifference): string {
  const what = differenceWords(d.field);
  if (d.field === "warnings") {
    // Stored as "code: message"; the reader gets the message alone.
    const words = (w: string) => w.replace(/^[a-z0-9]+(?:-[a-z0-9]+)*: /, "");
    if (d.sent === MISSING)
      return `A warning the server's search raises was missing from the preview: ${words(d.server)}`;
    if (d.server === MISSING)
      return `A warning in the preview that the server's search does not raise: ${words(d.sent)}`;
  }
  const a = Number(d.sent);
  const b = Number(d.server);
  if (d.sent !== "" && d.server !== "" && Number.isFinite(a) && Number.isFinite(b)) {
    const digits = Math.abs(a - b) >= 5e-5 ? (v: number) => v.toFixed(4) : (v: number) => v.toPrecision(10);
    return `${what}: preview ${digits(a)}, server ${digits(b)}`;
  }
  return `${what}: preview ${d.sent}, server ${d.server}`;
}
