"use client";

import { SHORTCUTS } from "./use-editor-keys";

interface ShortcutHelpProps {
  open: boolean;
  onToggle(): void;
}

/** The keyboard shortcuts: a visible button (or "?") shows the list beside the drawing. */
export function ShortcutHelp({ open, onToggle }: ShortcutHelpProps) {
  return (
    <div className="mt-2 text-xs text-ink-soft">
      <button
        type="button"
        className="btn-quiet px-2 py-1 text-xs"
        data-testid="shortcut-help-toggle"
        aria-expanded={open}
        aria-controls="editor-shortcuts"
        onClick={onToggle}
      >
        Keyboard shortcuts
        <kbd className="rounded bg-paper-sunk px-1 font-mono text-[10px] text-ink-soft">?</kbd>
      </button>
      {open && (
        <section
          id="editor-shortcuts"
          data-testid="shortcut-help"
          aria-label="Keyboard shortcuts"
          className="panel mt-2 grid gap-3 p-3"
        >
          {SHORTCUTS.map((g) => (
            <div key={g.group}>
              <h3 className="label">{g.group}</h3>
              <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
                {g.keys.map(([keys, what]) => (
                  <div key={keys + what} className="contents">
                    <dt className="whitespace-nowrap font-mono text-ink">{keys}</dt>
                    <dd>{what}</dd>
                  </div>
                ))}
              </dl>
            </div>
          ))}
        </section>
      )}
    </div>
  );
}
