import { describe, expect, it } from "vitest";
import {
  normaliseVerificationCode,
  newVerificationCode,
  VERIFICATION_ALPHABET,
  VERIFICATION_RANDOM_BYTES,
  verificationUrl,
} from "@/lib/certificates/verification-code";

const bytes = (...values: number[]) => Uint8Array.from(values);

describe("newVerificationCode", () => {
  it("uses 31 symbols without the look-alikes 0, O, 1, I and L (our rule)", () => {
    expect(VERIFICATION_ALPHABET).toHaveLength(31);
    expect(new Set(VERIFICATION_ALPHABET).size).toBe(31);
    for (const c of "0O1IL") expect(VERIFICATION_ALPHABET).not.toContain(c);
  });

  it("writes the bytes, read as one big-endian number modulo 31^12, in base 31", () => {
    // Check values computed independently with Python: int.from_bytes(b, "big") % 31**12, in base 31.
    expect(newVerificationCode(new Uint8Array(12))).toBe("2222-2222-2222");
    expect(newVerificationCode(bytes(...Array(11).fill(0), 1))).toBe("2222-2222-2223");
    expect(newVerificationCode(bytes(...Array(11).fill(0), 31))).toBe("2222-2222-2232");
    expect(newVerificationCode(bytes(...Array(12).fill(255)))).toBe("WBMZ-4XC4-W493");
    expect(newVerificationCode(bytes(1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12))).toBe("5ACS-ENTH-K6XF");
  });

  it("wants at least 10 random bytes, so that no code is noticeably likelier than another", () => {
    expect(VERIFICATION_RANDOM_BYTES).toBe(12);
    expect(() => newVerificationCode(bytes(1, 2, 3))).toThrow(RangeError);
    expect(() => newVerificationCode(new Uint8Array(9))).toThrow(/at least 10 random bytes/);
    expect(newVerificationCode(new Uint8Array(10))).toBe("2222-2222-2222");
    expect(newVerificationCode(new Uint8Array(32))).toMatch(/^\w{4}-\w{4}-\w{4}$/);
  });

  it("makes well-formed codes from random bytes", () => {
    for (let i = 0; i < 200; i++) {
      const random = Uint8Array.from({ length: VERIFICATION_RANDOM_BYTES }, () => Math.floor(Math.random() * 256));
      expect(newVerificationCode(random)).toMatch(/^[2-9A-HJKMNP-Z]{4}-[2-9A-HJKMNP-Z]{4}-[2-9A-HJKMNP-Z]{4}$/);
    }
  });
});

describe("normaliseVerificationCode", () => {
  it("accepts a code however it was typed: case, spaces, dashes", () => {
    for (const typed of ["7Q4K-2M9X-HT3B", "7q4k2m9xht3b", " 7Q4K 2M9X HT3B ", "7q4k–2m9x—ht3b", "7Q4K.2M9X_HT3B", "7Q-4K2M-9XHT-3B"])
      expect(normaliseVerificationCode(typed)).toBe("7Q4K-2M9X-HT3B");
  });

  it("keeps codes in the stored form, including the demo's", () => {
    expect(normaliseVerificationCode("demo-7q4k-2m9x")).toBe("DEMO-7Q4K-2M9X");
  });

  it("answers null for what cannot be a code", () => {
    for (const text of ["", "  - -", "7Q4K/2M9X", "<script>", "ÄÖÜ", "A".repeat(33)]) expect(normaliseVerificationCode(text)).toBeNull();
  });
});

describe("verificationUrl", () => {
  it("puts the code under /verify of the base address", () => {
    expect(verificationUrl("https://lab.example.test", "7Q4K-2M9X-HT3B")).toBe("https://lab.example.test/verify/7Q4K-2M9X-HT3B");
    expect(verificationUrl("https://lab.example.test/seepline//", "7Q4K-2M9X-HT3B")).toBe("https://lab.example.test/seepline/verify/7Q4K-2M9X-HT3B");
  });
});
