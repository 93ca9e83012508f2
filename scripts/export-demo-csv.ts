/**
 * Writes the demo section as the three CSV files a user can import (public/demo/), so the README's
 * "build the demo section by importing" path uses exactly the seeded section.
 * Run: npx tsx scripts/export-demo-csv.ts
 */
import fs from "node:fs";
import path from "node:path";
import { buildDemoSection } from "../db/seeds/demo-section";
import { geometryToCsv, materialsToCsv, phreaticToCsv } from "../lib/section-io";

const out = path.resolve(__dirname, "../public/demo");
fs.mkdirSync(out, { recursive: true });
const doc = buildDemoSection();
const names = Object.fromEntries(doc.materials.map((m) => [m.id, m.name ?? m.id]));
fs.writeFileSync(
  path.join(out, "demo-geometry.csv"),
  geometryToCsv(
    doc.regions,
    doc.regions.map((r) => (r.name ?? "region").toLowerCase().replace(/\s+/g, "-")),
  ),
);
fs.writeFileSync(path.join(out, "demo-phreatic.csv"), phreaticToCsv(doc.water!.phreatic!));
fs.writeFileSync(path.join(out, "demo-materials.csv"), materialsToCsv(doc.materials, names));
fs.writeFileSync(path.join(out, "demo-section.json"), JSON.stringify(doc, null, 2) + "\n");
console.error(`wrote ${out}`);
