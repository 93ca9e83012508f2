import { expect, test } from "vitest";
import { validateSection } from "@/lib/stability";
import { starterSection } from "@/lib/sections/starter";
import { buildDemoSection } from "@/db/seeds/demo-section";

test("starterSection() and the demo section pass the engine's own validation", () => {
  for (const doc of [starterSection(), buildDemoSection()]) {
    const v = validateSection(doc);
    expect(v.ok ? [] : v.errors).toEqual([]);
  }
});
