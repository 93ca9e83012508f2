import { CAUTION_TEXT } from "@/lib/caution";

export { CAUTION_TEXT };

export function Caution({ compact = false }: { compact?: boolean }) {
  return (
    <aside
      className={`rounded-md border-l-4 border-clay-500 bg-clay-50 text-ink-soft ${compact ? "px-3 py-1.5 text-xs" : "px-4 py-2 text-sm"}`}
      data-testid="caution"
    >
      <strong className="font-semibold text-ink">Engineering caution. </strong>
      {CAUTION_TEXT}
    </aside>
  );
}
