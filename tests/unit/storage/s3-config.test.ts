import { describe, expect, test } from "vitest";
import { readS3Settings } from "@/lib/storage/s3-config";

describe("readS3Settings(env)", () => {
  test("defaults to the local fake with path-style addresses", () => {
    expect(readS3Settings({})).toEqual({
      S3_ENDPOINT: "http://127.0.0.1:4569",
      S3_BUCKET: "scarpline-documents",
      S3_ACCESS_KEY_ID: "S3RVER",
      S3_SECRET_ACCESS_KEY: "S3RVER",
      S3_REGION: "us-east-1",
      S3_FORCE_PATH_STYLE: true,
    });
  });

  test("reads the variables given, including a false path-style switch", () => {
    const s = readS3Settings({
      S3_ENDPOINT: "http://127.0.0.1:9100",
      S3_BUCKET: "scarpline-test-1",
      S3_FORCE_PATH_STYLE: "false",
    });
    expect(s.S3_ENDPOINT).toBe("http://127.0.0.1:9100");
    expect(s.S3_BUCKET).toBe("scarpline-test-1");
    expect(s.S3_FORCE_PATH_STYLE).toBe(false);
  });

  test("names the variable that is wrong", () => {
    expect(() => readS3Settings({ S3_ENDPOINT: "not a url" })).toThrow(/S3_ENDPOINT/);
    expect(() => readS3Settings({ S3_BUCKET: "Upper_Case" })).toThrow(/S3_BUCKET: must be a valid bucket name/);
    expect(() => readS3Settings({ S3_FORCE_PATH_STYLE: "yes" })).toThrow(/S3_FORCE_PATH_STYLE/);
  });
});
