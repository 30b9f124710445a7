/**
 * Verification codes printed on certificates: twelve symbols in three groups of four ("7Q4K-2M9X-HT3B"),
 * from an alphabet without the look-alikes 0/O and 1/I/L, so a code read off paper can be typed back.
 * Pure: the caller supplies the random bytes (crypto.randomBytes in the app, fixed bytes in tests).
 */

/** 31 symbols: the digits 2-9 and the letters A-Z without I, L and O. */
export const VERIFICATION_ALPHABET = "23456789ABCDEFGHJKMNPQRSTUVWXYZ";

const SYMBOLS = 12;
const GROUP = 4;
const BASE = BigInt(VERIFICATION_ALPHABET.length);
const CODES = BASE ** BigInt(SYMBOLS); // 31^12, about 2^59.5

/** Random bytes newVerificationCode wants: 12 (96 bits), so every code is as likely as any other to within 1 part in 10^10. */
export const VERIFICATION_RANDOM_BYTES = 12;
// Fewer than 10 bytes (80 bits) would make some codes noticeably likelier than others.
const MIN_RANDOM_BYTES = 10;

function group(symbols: string): string {
  return symbols.match(new RegExp(`.{1,${GROUP}}`, "g"))?.join("-") ?? "";
}

/**
 * A new code (about 59 bits) from uniformly random bytes: they are read as one big-endian number, reduced
 * modulo 31^12 and written in base 31. Pass VERIFICATION_RANDOM_BYTES of them; fewer than 10 is a RangeError.
 */
export function newVerificationCode(randomBytes: Uint8Array): string {
  if (randomBytes.length < MIN_RANDOM_BYTES) throw new RangeError(`newVerificationCode needs at least ${MIN_RANDOM_BYTES} random bytes (got ${randomBytes.length}; pass ${VERIFICATION_RANDOM_BYTES})`);
  let n = BigInt(0);
  for (const byte of randomBytes) n = (n << BigInt(8)) | BigInt(byte);
  n %= CODES;
  let symbols = "";
  for (let i = 0; i < SYMBOLS; i++) {
    symbols = VERIFICATION_ALPHABET[Number(n % BASE)] + symbols;
    n /= BASE;
  }
  return group(symbols);
}

/**
 * A code as typed or scanned, in the stored form: capitals, separators (spaces, dashes, dots,
 * underscores) removed and regrouped in fours. Null when what is left cannot be a code (empty, too long,
 * or holding anything but letters and digits).
 */
export function normaliseVerificationCode(text: string): string | null {
  const symbols = text.toUpperCase().replace(/[\s\-\u2010-\u2015._]+/g, "");
  if (symbols.length === 0 || symbols.length > 32 || !/^[A-Z0-9]+$/.test(symbols)) return null;
  return group(symbols);
}

/** The public verification page of a code: `${baseUrl}/verify/${code}` (a trailing slash on baseUrl is dropped). */
export function verificationUrl(baseUrl: string, code: string): string {
  return `${baseUrl.replace(/\/+$/, "")}/verify/${encodeURIComponent(code)}`;
}
