import { describe, expect, test } from "vitest";
import { attachmentDisposition, cleanFileName } from "@/lib/storage/content-disposition";

describe("attachmentDisposition(fileName)", () => {
  test("keeps a plain name as it is in both forms", () => {
    expect(attachmentDisposition("levels.csv")).toBe(`attachment; filename="levels.csv"; filename*=UTF-8''levels.csv`);
  });

  test("replaces quotes, backslashes and non-ASCII in the fallback and percent-encodes the UTF-8 form", () => {
    const header = attachmentDisposition(`Prüfung "B-3" (4,5 m)\\x.pdf`);
    expect(header).toContain(`filename="Pr_fung _B-3_ (4,5 m)_x.pdf"`);
    expect(header).toContain(`filename*=UTF-8''Pr%C3%BCfung%20%22B-3%22%20%284%2C5%20m%29%5Cx.pdf`);
    const encoded = header.split("filename*=UTF-8''")[1];
    expect(decodeURIComponent(encoded)).toBe(`Prüfung "B-3" (4,5 m)\\x.pdf`);
  });
});

describe("cleanFileName(raw)", () => {
  test("keeps the last path part without control characters", () => {
    expect(cleanFileName("C:\\fakepath\\crest survey.csv")).toBe("crest survey.csv");
    expect(cleanFileName("../../etc/levels.csv")).toBe("levels.csv");
    expect(cleanFileName("toe\u0000\u0007.png ")).toBe("toe.png");
  });

  test("is null when nothing usable is left", () => {
    expect(cleanFileName("")).toBeNull();
    expect(cleanFileName("dir/")).toBeNull();
    expect(cleanFileName("..")).toBeNull();
  });
});
