"use client";

import { useState } from "react";

interface CoordinateInputProps {
  value: number;
  label: string;
  readOnly: boolean;
  testId: string;
  onCommit(v: number): void;
  onFocus(): void;
}

/**
 * A metre value shown to 2 decimals that accepts any precision. Typed text is kept while
 * the field has focus and applied on Enter or when leaving the field, so one edit is one
 * undo step; a field left untouched never rounds the stored value; text that is not a
 * number puts the old value back.
 */
export function CoordinateInput({ value, label, readOnly, testId, onCommit, onFocus }: CoordinateInputProps) {
  const [text, setText] = useState<string | null>(null);
  const apply = () => {
    if (text === null) return;
    const v = Number(text.trim().replace(",", "."));
    setText(null);
    if (text.trim() !== "" && Number.isFinite(v) && v !== value) onCommit(v);
  };
  return (
    <input
      type="number"
      step="any"
      inputMode="decimal"
      aria-label={label}
      data-testid={testId}
      readOnly={readOnly}
      className="field px-1.5 py-0.5 text-right font-mono text-xs"
      value={text ?? value.toFixed(2)}
      // The shown text must not change on focus: that would move the caret under a typing user.
      onFocus={onFocus}
      onChange={(e) => setText(e.target.value)}
      onBlur={apply}
      onKeyDown={(e) => {
        if (e.key === "Enter") apply();
        if (e.key === "Escape") setText(null);
      }}
    />
  );
}
