"use client";

import type { SectionDocument } from "@/lib/stability";
import type { LoadingConditionKey } from "@/lib/analysis/required-fs";
import { poolLevels, waterMismatch, type WaterCondition } from "@/lib/sections/water-conditions";

interface WaterConditionFieldProps {
  doc: SectionDocument;
  conditions: readonly WaterCondition[];
  loadingCondition: LoadingConditionKey;
  value: string;
  onChange(id: string): void;
}

const level = (v: number | null) => (v === null ? "none" : `${v.toFixed(2)} m`);

/** Which of the section's water conditions the run analyses; the loading condition proposes its usual one. */
export function WaterConditionField({ doc, conditions, loadingCondition, value, onChange }: WaterConditionFieldProps) {
  const chosen = conditions.find((c) => c.id === value) ?? null;
  const pools = chosen ? poolLevels(doc, chosen.water) : null;
  const mismatch = chosen ? waterMismatch(doc, loadingCondition, chosen) : null;
  const usual = chosen?.usualFor.includes(loadingCondition);
  return (
    <div data-testid="water-condition-field">
      <label className="label" htmlFor="f-waterCondition">
        Water analysed
      </label>
      <select
        id="f-waterCondition"
        className="field"
        value={value}
        onChange={(e) => onChange(e.target.value)}
        data-testid="water-condition"
      >
        {conditions.map((c) => (
          <option key={c.id} value={c.id}>
            {c.name}
          </option>
        ))}
      </select>
      {chosen ? (
        <p className="mt-1 text-xs text-ink-soft" data-testid="water-condition-summary">
          {chosen.water?.phreatic ? "Phreatic line" : chosen.water?.ru !== undefined ? `ru ${chosen.water.ru}` : "Dry"}
          {" · "}pool left {level(pools!.left)}, right {level(pools!.right)}
          {chosen.kind === "drawdown" && chosen.drawdownTo !== undefined
            ? ` · lowered to ${chosen.drawdownTo.toFixed(2)} m`
            : ""}
          {usual ? " · the usual water for this loading condition" : ""}
        </p>
      ) : null}
      {mismatch ? (
        <p className="mt-1 text-xs text-alarm-700" role="note" data-testid="water-condition-mismatch">
          {mismatch}
        </p>
      ) : null}
    </div>
  );
}
