// API keys: format, checksum and hashing (OWASP API2: broken authentication; secret scanning).
import { describe, expect, it, vi } from "vitest";
import { deriveKey, generateKey, hashKey, KEY_LENGTH, KEY_PATTERN, parseKey, visiblePrefix } from "@/api-core/access/key-format";
import { identifyKey } from "@/api-core/http/key-auth";

const ALPHABET = "0123456789abcdefghjkmnpqrstvwxyz";

/** Every key that differs from `key` in one body or checksum character. */
function singleCharacterTypos(key: string): string[] {
  const typos: string[] = [];
  for (let i = 4; i < key.length; i++) for (const c of ALPHABET) if (c !== key[i]) typos.push(key.slice(0, i) + c + key.slice(i + 1));
  return typos;
}

describe("key format", () => {
  it("is cmv_ + 38 base32 characters, recognisable by the scanner pattern, and parses", () => {
    const key = generateKey();
    expect(key).toHaveLength(KEY_LENGTH);
    expect(key.match(KEY_PATTERN)).toEqual([key]);
    expect(parseKey(key)).toEqual({ ok: true, secret: key, hash: hashKey(key), prefix: visiblePrefix(key) });
  });

  it("carries at least 128 random bits: 1000 keys are all different and use the whole alphabet", () => {
    const keys = new Set(Array.from({ length: 1000 }, generateKey));
    expect(keys.size).toBe(1000);
    const used = new Set([...keys].flatMap((k) => [...k.slice(4, 36)]));
    expect(used.size).toBe(32);
  });

  it("rejects every single-character typo by checksum", () => {
    const key = generateKey();
    const typos = singleCharacterTypos(key);
    expect(typos.length).toBe(38 * 31);
    const accepted = typos.filter((typo) => parseKey(typo).ok);
    expect(accepted).toEqual([]);
  });

  it("rejects truncation, a foreign prefix, upper case and characters outside the alphabet, saying why", () => {
    const key = generateKey();
    expect(parseKey(key.slice(0, -1))).toMatchObject({ ok: false, reason: expect.stringContaining("42 characters") });
    expect(parseKey("xyz_" + key.slice(4))).toMatchObject({ ok: false, reason: expect.stringContaining('"cmv_"') });
    expect(parseKey(key.toUpperCase().replace("CMV_", "cmv_"))).toMatchObject({ ok: false });
    expect(parseKey(key.slice(0, 10) + "l" + key.slice(11))).toMatchObject({ ok: false, reason: expect.stringContaining("character") });
  });

  it("derives a stable key per secret (the demo key) and a different one for another secret", () => {
    const a = deriveKey("installation secret one, long enough", "demo");
    expect(deriveKey("installation secret one, long enough", "demo")).toBe(a);
    expect(deriveKey("installation secret two, long enough", "demo")).not.toBe(a);
    expect(parseKey(a).ok).toBe(true);
  });

  it("stores a SHA-256 hash, never the key, and shows only a 10-character prefix", () => {
    const key = generateKey();
    expect(hashKey(key)).toMatch(/^[0-9a-f]{64}$/);
    expect(hashKey(key)).not.toContain(key.slice(4));
    expect(visiblePrefix(key)).toBe(key.slice(0, 10));
  });
});

describe("guard step 1, identifyKey", () => {
  const call = (authorization: string) => new Request("http://comova.test/api/v1/distances", { headers: { authorization } });

  it("refuses a mistyped key with 401 before any database read", async () => {
    const lookup = vi.fn(async () => undefined);
    const key = generateKey();
    const typo = key.slice(0, 20) + (key[20] === "a" ? "b" : "a") + key.slice(21);
    await expect(identifyKey(call(`Bearer ${typo}`), lookup)).rejects.toMatchObject({ status: 401, slug: "invalid-key", headers: { "WWW-Authenticate": expect.stringContaining("Bearer") } });
    expect(lookup).not.toHaveBeenCalled();
  });

  it("looks up a well-formed key by its hash only", async () => {
    const lookup = vi.fn(async () => undefined);
    const key = generateKey();
    await expect(identifyKey(call(`Bearer ${key}`), lookup)).rejects.toMatchObject({ status: 401 });
    expect(lookup).toHaveBeenCalledExactlyOnceWith(hashKey(key));
  });

  it("answers a missing header with a bare Bearer challenge (RFC 6750 §3.1)", async () => {
    const lookup = vi.fn(async () => undefined);
    await expect(identifyKey(new Request("http://comova.test/x"), lookup)).rejects.toMatchObject({ status: 401, headers: { "WWW-Authenticate": 'Bearer realm="comova"' } });
    expect(lookup).not.toHaveBeenCalled();
  });
});
