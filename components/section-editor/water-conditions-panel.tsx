"use client";

import { useState } from "react";
import type { SectionDocument } from "@/lib/stability";
import { LOADING_CONDITIONS, type LoadingConditionKey } from "@/lib/analysis/required-fs";
import {
  poolLevels,
  WATER_KIND_LABELS,
  WATER_KINDS,
  waterConditionsOf,
  type WaterCondition,
  type WaterKind,
} from "@/lib/sections/water-conditions";

type Patch = Partial<Pick<WaterCondition, "name" | "kind" | "drawdownTo" | "usualFor">>;

interface WaterConditionsPanelProps {
  doc: SectionDocument;
  activeId: string;
  readOnly: boolean;
  onShow(id: string): void;
  onAdd(name: string): void;
  onUpdate(id: string, patch: Patch): void;
  onRemove(id: string): void;
}

const level = (v: number | null) => (v === null ? "none" : `${v.toFixed(2)} m`);

/** A text or number field that commits once, on leaving it or pressing Enter, so typing is one undo step. */
function CommitField({
  id,
  label,
  value,
  type = "text",
  unit,
  disabled,
  onCommit,
}: {
  id: string;
  label: string;
  unit?: string;
  value: string;
  type?: "text" | "number";
  disabled: boolean;
  onCommit(text: string): void;
}) {
  const [text, setText] = useState<string | null>(null);
  const commit = () => {
    if (text !== null && text !== value) onCommit(text);
    setText(null);
  };
  return (
    <div>
      <label className="label" htmlFor={id}>
        {label}
        {unit ? <span className="normal-case text-ink-faint"> ({unit})</span> : null}
      </label>
      <input
        id={id}
        data-testid={id}
        type={type}
        step={type === "number" ? "any" : undefined}
        className="field py-1 text-xs"
        value={text ?? value}
        disabled={disabled}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === "Enter") {
            e.preventDefault();
            commit();
          }
        }}
      />
    </div>
  );
}

/**
 * The section's named waters. The drawing shows one of them: the phreatic-line and reservoir
 * tools edit that one, and a run picks any of them.
 */
export function WaterConditionsPanel({
  doc,
  activeId,
  readOnly,
  onShow,
  onAdd,
  onUpdate,
  onRemove,
}: WaterConditionsPanelProps) {
  const all = waterConditionsOf(doc);
  const active = all.find((c) => c.id === activeId) ?? all[0];
  const pools = poolLevels(doc, doc.water);
  const toggleUsual = (key: LoadingConditionKey, on: boolean) =>
    onUpdate(active.id, {
      usualFor: on ? [...active.usualFor.filter((k) => k !== key), key] : active.usualFor.filter((k) => k !== key),
    });
  return (
    <section className="panel space-y-2 p-3" data-testid="water-conditions-panel" aria-label="Water conditions">
      <h3 className="label">Water conditions</h3>
      <p className="text-xs text-ink-soft">
        One water per loading condition. The drawing shows the one chosen here; the line and reservoir tools edit it.
      </p>
      <div>
        <label className="label" htmlFor="water-condition-shown">
          Drawn and edited
        </label>
        <select
          id="water-condition-shown"
          data-testid="water-condition-shown"
          className="field py-1 text-xs"
          value={active.id}
          onChange={(e) => onShow(e.target.value)}
        >
          {all.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </select>
      </div>
      <CommitField
        key={`name-${active.id}`}
        id="water-condition-name"
        label="Name"
        value={active.name}
        disabled={readOnly}
        onCommit={(t) => t.trim().length >= 2 && onUpdate(active.id, { name: t.trim() })}
      />
      <div>
        <label className="label" htmlFor="water-condition-kind">
          Kind
        </label>
        <select
          id="water-condition-kind"
          data-testid="water-condition-kind"
          className="field py-1 text-xs"
          value={active.kind}
          disabled={readOnly}
          onChange={(e) => onUpdate(active.id, { kind: e.target.value as WaterKind })}
        >
          {WATER_KINDS.map((k) => (
            <option key={k} value={k}>
              {WATER_KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </div>
      {active.kind === "drawdown" ? (
        <CommitField
          key={`to-${active.id}`}
          id="water-condition-drawdown-to"
          label="Pool after drawdown"
          unit="m"
          type="number"
          value={active.drawdownTo !== undefined ? String(active.drawdownTo) : ""}
          disabled={readOnly}
          onCommit={(t) => {
            const v = Number(t);
            onUpdate(active.id, { drawdownTo: t.trim() !== "" && Number.isFinite(v) ? v : undefined });
          }}
        />
      ) : null}
      <p className="text-[11px] text-ink-faint" data-testid="water-condition-pools">
        Pool on the left {level(pools.left)}, on the right {level(pools.right)}
        {doc.water?.ru !== undefined && !doc.water.phreatic ? ` · ru ${doc.water.ru}` : ""}
        {!doc.water?.phreatic && doc.water?.ru === undefined ? " · dry" : ""}
      </p>
      <fieldset>
        <legend className="label">Usual water for</legend>
        {LOADING_CONDITIONS.map((c) => (
          <label key={c.key} className="flex items-center gap-1.5 text-xs">
            <input
              type="checkbox"
              checked={active.usualFor.includes(c.key)}
              disabled={readOnly}
              onChange={(e) => toggleUsual(c.key, e.target.checked)}
            />
            {c.label}
          </label>
        ))}
      </fieldset>
      <div className="flex gap-1.5">
        <button
          type="button"
          className="btn-quiet px-2 py-1 text-xs"
          data-testid="water-condition-add"
          disabled={readOnly}
          onClick={() => onAdd(`Water condition ${all.length + 1}`)}
        >
          Add a condition
        </button>
        <button
          type="button"
          className="btn-quiet px-2 py-1 text-xs"
          data-testid="water-condition-remove"
          disabled={readOnly || all.length <= 1}
          onClick={() => onRemove(active.id)}
        >
          Remove this one
        </button>
      </div>
    </section>
  );
}
