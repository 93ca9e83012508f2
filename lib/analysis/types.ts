import type { LoadingConditionKey } from "./required-fs";

// A project's required FS per loading condition (db/queries/loading-conditions.ts fills it from rows).

export interface ConditionSetting {
  key: LoadingConditionKey;
  label: string;
  faces: string;
  requiredFs: number;
  defaultFs: number;
  basis: string;
  /** Why the project departs from the default; null while it follows it. */
  reason: string | null;
  updatedByName: string | null;
  updatedAt: string | null;
}
