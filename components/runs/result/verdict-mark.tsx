import { verdictWords, type Verdict } from "@/lib/runs/view/verdict";

/** ✓ or ✕ with words; the colour only repeats what the shape and the words say. */
export function VerdictMark({ verdict, required }: { verdict: Verdict; required?: number | null }) {
  if (verdict === "none")
    return (
      <span className="text-ink-faint" data-verdict="none">
        —
      </span>
    );
  const pass = verdict === "pass";
  return (
    <span
      className={`inline-flex items-center gap-1 font-medium ${pass ? "text-moss-700" : "text-alarm-700"}`}
      data-verdict={verdict}
    >
      <span
        aria-hidden="true"
        className={`inline-flex h-4 w-4 items-center justify-center text-[11px] leading-none text-white ${pass ? "rounded-full bg-moss-600" : "rounded-sm bg-alarm-600"}`}
      >
        {pass ? "✓" : "✕"}
      </span>
      {verdictWords(verdict, required)}
    </span>
  );
}
