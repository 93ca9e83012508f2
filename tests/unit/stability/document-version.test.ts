/**
 * The second edition of the document contract only adds optional keys, so a document may say
 * `"version": 2` and a version 1 document gives the same result (docs/engine-io.md, "The document").
 */
import { describe, expect, test } from "vitest";
import { runGridSearch } from "@/lib/stability";
import { clone, loadFixture, search } from "./helpers";

describe("document version", () => {
  test.each(["acads-1a.json", "three-material-embankment.json"])("%s: version 2 gives version 1's result", (name) => {
    const v1 = loadFixture(name);
    const v2 = { ...clone(v1), version: 2 as const };
    const a = search(v1);
    const b = search(v2);
    expect(b.results.bishop?.fs).toBe(a.results.bishop?.fs);
    expect(b.results.fellenius?.fs).toBe(a.results.fellenius?.fs);
    expect(b.results.bishop?.circle).toEqual(a.results.bishop?.circle);
  });

  test("any other version is refused at its path", () => {
    const doc = { ...clone(loadFixture("acads-1a.json")), version: 3 };
    const r = runGridSearch(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.map((e) => e.path)).toContain("version");
  });
});
