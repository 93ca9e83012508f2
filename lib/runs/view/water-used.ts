/** Which water a kept run analysed, in the words every view of the run uses. */
export const SINGLE_WATER_TEXT = "The section's single water line (no named water conditions)";

export function waterUsedText(run: { waterCondition: { name: string } | null }): string {
  return run.waterCondition?.name ?? SINGLE_WATER_TEXT;
}
