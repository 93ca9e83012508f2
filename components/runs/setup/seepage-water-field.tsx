"use client";

import Link from "next/link";

interface SeepageWaterFieldProps {
  checked: boolean;
  /** False for a water with no pool to seep from (end of construction) or without seepage inputs. */
  available: boolean;
  seepageHref: string | null;
  error: string | null;
  onChange(on: boolean): void;
}

/** Whether the run's pore pressures come from the chosen water's finite-element seepage solution. */
export function SeepageWaterField({ checked, available, seepageHref, error, onChange }: SeepageWaterFieldProps) {
  if (!available) return null;
  return (
    <div className="mt-2 text-sm" data-testid="seepage-water-field">
      <label className="flex items-start gap-2">
        <input
          type="checkbox"
          className="mt-1"
          checked={checked}
          onChange={(e) => onChange(e.target.checked)}
          data-testid="water-from-seepage"
        />
        <span>
          Pore pressures from the seepage solution of this water (finite elements; the drawn line is replaced by the
          computed phreatic surface)
        </span>
      </label>
      {checked && seepageHref ? (
        <p className="mt-1 text-xs text-ink-soft">
          Drains, mesh size and conductivities are those of the{" "}
          <Link href={seepageHref} className="underline">
            seepage view
          </Link>
          .
        </p>
      ) : null}
      {error ? (
        <p className="mt-1 text-xs text-alarm-700" role="alert" data-testid="seepage-water-error">
          {error}
        </p>
      ) : null}
    </div>
  );
}
