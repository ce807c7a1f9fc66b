import { createHash, createHmac, randomBytes } from "node:crypto";

/**
 * Comova API keys: `cmv_` + 32 body characters (160 random bits) + 6 checksum characters, all in
 * the lowercase Crockford base32 alphabet (no i, l, o, u, so fewer misread characters), e.g.
 * `cmv_8f3k2m…q7h1z4`. The checksum is the top 30 bits of SHA-256("cmv_" + body): a secret scanner
 * can recognise a leaked key with {@link KEY_PATTERN} and {@link parseKey} alone, and a mistyped key
 * is refused before any database read. Keys are stored only as SHA-256 hashes (a high-entropy secret
 * needs no slow hash); the first characters are kept as a visible prefix for people.
 */
export const KEY_TYPE_PREFIX = "cmv_";
const ALPHABET = "0123456789abcdefghjkmnpqrstvwxyz";
const BODY_LENGTH = 32;
const CHECKSUM_LENGTH = 6;
/** Visible prefix: the type plus 6 body characters (30 bits), leaving 130 unknown bits. */
const VISIBLE_BODY_CHARACTERS = 6;
export const KEY_LENGTH = KEY_TYPE_PREFIX.length + BODY_LENGTH + CHECKSUM_LENGTH;

/** What a secret scanner looks for. */
export const KEY_PATTERN = /\bcmv_[0-9a-hjkmnp-tv-z]{38}\b/g;

/** Base32 of `bytes`, most significant bit first; exactly `length` characters. */
function base32(bytes: Buffer, length: number): string {
  let bits = 0n;
  for (const byte of bytes) bits = (bits << 8n) | BigInt(byte);
  const available = bytes.length * 8;
  let out = "";
  for (let i = 0; i < length; i++) {
    const shift = BigInt(available - 5 * (i + 1));
    out += ALPHABET[Number((bits >> shift) & 31n)];
  }
  return out;
}

function checksum(body: string): string {
  return base32(createHash("sha256").update(KEY_TYPE_PREFIX + body).digest().subarray(0, 4), CHECKSUM_LENGTH);
}

export function hashKey(secret: string): string {
  return createHash("sha256").update(secret).digest("hex");
}

export function visiblePrefix(secret: string): string {
  return secret.slice(0, KEY_TYPE_PREFIX.length + VISIBLE_BODY_CHARACTERS);
}

function assemble(body: string): string {
  return KEY_TYPE_PREFIX + body + checksum(body);
}

export function generateKey(): string {
  return assemble(base32(randomBytes(20), BODY_LENGTH));
}

/** A stable key derived from a secret and a label (the demo key: the same on every start of one installation). */
export function deriveKey(secret: string, label: string): string {
  return assemble(base32(createHmac("sha256", secret).update(label).digest().subarray(0, 20), BODY_LENGTH));
}

export type ParsedKey = { ok: true; secret: string; hash: string; prefix: string } | { ok: false; reason: string };

/** Checks a presented key's shape and checksum, without touching the database. */
export function parseKey(candidate: string): ParsedKey {
  if (!candidate.startsWith(KEY_TYPE_PREFIX)) return { ok: false, reason: `Comova API keys start with "${KEY_TYPE_PREFIX}".` };
  if (candidate.length !== KEY_LENGTH) return { ok: false, reason: `Comova API keys are ${KEY_LENGTH} characters long; this one has ${candidate.length}.` };
  const rest = candidate.slice(KEY_TYPE_PREFIX.length);
  if ([...rest].some((c) => !ALPHABET.includes(c))) return { ok: false, reason: "The key contains a character that Comova keys never use; copy it again." };
  const body = rest.slice(0, BODY_LENGTH);
  if (checksum(body) !== rest.slice(BODY_LENGTH)) return { ok: false, reason: "The key's checksum does not match: it was probably mistyped or truncated; copy it again." };
  return { ok: true, secret: candidate, hash: hashKey(candidate), prefix: visiblePrefix(candidate) };
}
