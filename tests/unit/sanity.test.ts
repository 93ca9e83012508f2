import { expect, test } from "vitest";
test("arithmetic works", () => { expect(1 + 1).toBe(2); });
