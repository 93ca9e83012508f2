import { describe, expect, test } from "vitest";
import { validateSection } from "@/lib/stability";
import { issueInWords, messageWords, placeNamesOf, placeWords } from "@/lib/issue-words";

// Issue 18, item 5: messages use the numbering the side panel shows (regions and vertices from 1),
// never the document's zero-based paths. The primes are the typographic prime (U+2032), as the
// trade prints c′ and φ′ (common practice).
describe("engine issue paths in the panel's numbering", () => {
  test("places read from 1, with the item's name when it has one", () => {
    expect(placeWords("regions[2].points[4]")).toBe("Region 3, vertex 5");
    expect(placeWords("regions[0].material", { regions: ["Core"] })).toBe("Region 1 (Core), material");
    expect(placeWords("water.phreatic[1]")).toBe("Phreatic line, point 2");
    expect(placeWords("materials[0].phi", { materials: ["Shell fill"] })).toBe("Material 1 (Shell fill), φ′");
    expect(placeWords("loads.surcharges[1].q")).toBe("Surcharge 2, q");
    expect(placeWords("")).toBe("The section");
  });

  test("a crossing names the edges by the vertices the panel numbers", () => {
    expect(messageWords("regions[2]: edges 0–1 and 4–5 cross at (3, 4). Redraw the region without crossings.")).toBe(
      "Region 3: the edges between vertices 1–2 and 5–6 cross at (3, 4). Redraw the region without crossings.",
    );
    expect(messageWords("Fill: φ' = 61° must be below 60°; c' ≥ 0.")).toBe("Fill: φ′ = 61° must be below 60°; c′ ≥ 0.");
  });

  test("a real engine finding, a bow-tie region, comes out without any zero-based path", () => {
    // A bow-tie outline crosses itself: a fact of geometry, whatever the numbers.
    const doc = {
      version: 1,
      materials: [{ id: "fill", model: "mohr-coulomb", gamma: 19, c: 5, phi: 30 }],
      regions: [
        {
          material: "fill",
          points: [
            [0, 0],
            [10, 10],
            [10, 0],
            [0, 10],
          ],
        },
      ],
    };
    const v = validateSection(doc);
    expect(v.ok).toBe(false);
    const words = (v.ok ? [] : v.errors).map((i) => issueInWords(i, placeNamesOf(doc)).message);
    expect(words.join(" ")).toMatch(/Region 1: the edges between vertices \d–\d and \d–\d cross/);
    expect(words.join(" ")).not.toMatch(/\w\[\d+\]/);
  });
});
