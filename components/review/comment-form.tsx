"use client";

import { useState } from "react";
import { FieldError, FormBanner } from "@/components/ui/form-message";
import { useRunAction } from "./use-run-action";
import { countOf } from "@/lib/format";

type Attach = "none" | "place" | "slice";

export interface CommentFormProps {
  apiBase: string;
  /** Slice counts per method with a slice table. */
  sliceCounts: Partial<Record<"bishop" | "fellenius", number>>;
  /** The place picked on the canvas, if any. */
  pin: { x: number; y: number } | null;
  placing: boolean;
  onPlacing: (on: boolean) => void;
  onClearPin: () => void;
}

const METHOD_LABEL = { bishop: "Bishop", fellenius: "Ordinary" } as const;

/** A comment on the run, pinned to a place on the section, to a slice, or to neither. */
export function CommentForm({ apiBase, sliceCounts, pin, placing, onPlacing, onClearPin }: CommentFormProps) {
  const methods = (Object.keys(sliceCounts) as ("bishop" | "fellenius")[]).filter((m) => (sliceCounts[m] ?? 0) > 0);
  const [attach, setAttach] = useState<Attach>("none");
  const [body, setBody] = useState("");
  const [slice, setSlice] = useState("");
  const [method, setMethod] = useState<"bishop" | "fellenius">(methods[0] ?? "bishop");
  const { run, busy, error } = useRunAction();

  function choose(a: Attach) {
    setAttach(a);
    if (a !== "place") {
      onPlacing(false);
      onClearPin();
    } else if (!pin) onPlacing(true);
  }

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const json = {
      body,
      pin: attach === "place" ? pin : null,
      slice: attach === "slice" ? { number: Number(slice), method } : null,
    };
    if (await run(`${apiBase}/comments`, { method: "POST", json })) {
      setBody("");
      setSlice("");
      setAttach("none");
      onClearPin();
      onPlacing(false);
    }
  }

  return (
    <form onSubmit={submit} className="space-y-2" noValidate data-testid="comment-form">
      <label className="label" htmlFor="comment-body">
        New comment
      </label>
      <textarea
        id="comment-body"
        className="field min-h-20"
        value={body}
        onChange={(e) => setBody(e.target.value)}
        maxLength={4000}
      />
      <FieldError messages={error?.fields.body} />
      <fieldset className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
        <legend className="sr-only">Pin the comment to</legend>
        {(["none", "place", "slice"] as const).map((a) => (
          <label key={a} className="inline-flex items-center gap-1.5">
            <input
              type="radio"
              name="attach"
              checked={attach === a}
              onChange={() => choose(a)}
              disabled={a === "slice" && methods.length === 0}
            />
            {a === "none" ? "Not pinned" : a === "place" ? "A place on the section" : "A slice"}
          </label>
        ))}
      </fieldset>
      {attach === "place" ? (
        <div className="flex flex-wrap items-center gap-2 text-sm" data-testid="pin-status">
          {pin ? (
            <span>
              Pinned at x = {pin.x.toFixed(2)} m, y = {pin.y.toFixed(2)} m
            </span>
          ) : (
            <span className="text-ink-soft">{placing ? "Click on the section above." : "No place picked."}</span>
          )}
          <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={() => onPlacing(!placing)}>
            {placing ? "Stop picking" : pin ? "Pick again" : "Pick the place"}
          </button>
        </div>
      ) : null}
      {attach === "slice" ? (
        <div className="flex flex-wrap items-end gap-2 text-sm">
          <div>
            <label className="label" htmlFor="comment-slice">
              Slice number
            </label>
            <input
              id="comment-slice"
              className="field w-24"
              inputMode="numeric"
              value={slice}
              onChange={(e) => setSlice(e.target.value)}
            />
          </div>
          {methods.length > 1 ? (
            <div>
              <label className="label" htmlFor="comment-method">
                Of the circle by
              </label>
              <select
                id="comment-method"
                className="field"
                value={method}
                onChange={(e) => setMethod(e.target.value as "bishop" | "fellenius")}
              >
                {methods.map((m) => (
                  <option key={m} value={m}>
                    {METHOD_LABEL[m]} ({countOf(sliceCounts[m] ?? 0, "slice")})
                  </option>
                ))}
              </select>
            </div>
          ) : (
            <span className="pb-2 text-xs text-ink-soft">1 to {sliceCounts[method]}</span>
          )}
          <FieldError messages={error?.fields["slice.number"]} />
        </div>
      ) : null}
      {error ? <FormBanner kind="error">{error.message}</FormBanner> : null}
      <button
        type="submit"
        className="btn-primary"
        disabled={busy || body.trim().length === 0 || (attach === "place" && !pin) || (attach === "slice" && !slice)}
      >
        {busy ? "Saving…" : "Add comment"}
      </button>
    </form>
  );
}
