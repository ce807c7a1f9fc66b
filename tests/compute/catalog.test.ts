import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { catalogUpload, streamCatalog, type CatalogPlan } from "@/api-core/http/csv";

const encoder = new TextEncoder();

/** A CSV source that makes rows only when asked, counting how many it has produced. */
function lazySource(rows: number) {
  const state = { produced: 0 };
  const stream = new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(encoder.encode("id,z\n"));
    },
    pull(controller) {
      if (state.produced >= rows) return controller.close();
      let text = "";
      for (let i = 0; i < 1000 && state.produced < rows; i++, state.produced++) text += `${state.produced},${state.produced % 7}\n`;
      controller.enqueue(encoder.encode(text));
    },
  }, { highWaterMark: 0 });
  return { stream, state };
}

// A stand-in computation (2z), so the test checks the streaming, not the physics.
const plan = (charged: number[] = []): CatalogPlan => ({
  zColumn: "z",
  quantities: ["double"],
  rowLimit: 1_000_000,
  async compute(z) {
    charged.push(z.length);
    return [z.map((v) => 2 * v)];
  },
});

async function readAll(stream: ReadableStream<Uint8Array>) {
  return new Response(stream).text();
}

describe("streamCatalog", () => {
  it("keeps every row in order, flags bad ones, and charges only computed rows", async () => {
    const charged: number[] = [];
    const source = new Response("id,z\na,1\nb,x\nc,-2\nd,3,4\ne,0\n").body!;
    const text = await readAll(await streamCatalog(source, plan(charged)));
    const rows = Papa.parse<string[]>(text.trim()).data;
    expect(rows[0]).toEqual(["id", "z", "double", "error"]);
    expect(rows.slice(1).map((r) => [r[0], r[2]])).toEqual([["a", "2"], ["b", ""], ["c", ""], ["d", ""], ["e", "0"]]);
    expect(rows.slice(1).map((r) => r[3] !== "")).toEqual([false, true, true, true, false]);
    expect(charged.reduce((a, b) => a + b, 0)).toBe(2);
  });

  it("reads the upload only as fast as the answer is consumed (memory stays flat)", { timeout: 60_000 }, async () => {
    const { stream, state } = lazySource(200_000);
    const answer = (await streamCatalog(stream, plan())).getReader();
    await answer.read();
    await new Promise((r) => setTimeout(r, 50));
    // After one chunk of the answer, only a few batches of the million rows have been made.
    expect(state.produced).toBeLessThan(50_000);
    let lines = 4096; // the first chunk held the header and the first 4096 rows
    for (let chunk = await answer.read(); !chunk.done; chunk = await answer.read()) lines += new TextDecoder().decode(chunk.value).split("\r\n").length - 1;
    expect(state.produced).toBe(200_000);
    expect(lines).toBe(200_000);
  });

  it("stops the stream with an error beyond the row limit", async () => {
    const { stream } = lazySource(20_000);
    const answer = await streamCatalog(stream, { ...plan(), rowLimit: 10_000 });
    await expect(readAll(answer)).rejects.toThrow(/more than 10000 rows/);
  });
});

describe("catalogUpload", () => {
  const limits = { catalogBytes: 1000, multipartBytes: 1000 };
  const streamed = (text: string) => new Response(text).body!; // no Content-Length: the limit is met while reading

  it("refuses a multipart body that grows past its limit with 413, and other types with 415", async () => {
    const form = new FormData();
    form.set("file", new Blob(["id,z\n" + "a,1\n".repeat(500)]), "big.csv");
    const encoded = new Response(form);
    const request = new Request("http://x/api/v1/catalogs", { method: "POST", body: encoded.body, headers: { "content-type": encoded.headers.get("content-type")! }, duplex: "half" } as RequestInit);
    await expect(catalogUpload(request, limits)).rejects.toMatchObject({ status: 413, detail: expect.stringContaining("1000 bytes") });
    const json = new Request("http://x/", { method: "POST", body: "{}", headers: { "content-type": "application/json" } });
    await expect(catalogUpload(json, limits)).rejects.toMatchObject({ status: 415 });
  });

  it("stops a raw text/csv stream at its byte limit (here within the first batch, so still a 413 answer)", async () => {
    const request = new Request("http://x/", { method: "POST", body: streamed("id,z\n" + "a,1\n".repeat(5000)), headers: { "content-type": "text/csv" }, duplex: "half" } as RequestInit);
    const answer = catalogUpload(request, limits).then((upload) => streamCatalog(upload, plan())).then(readAll);
    await expect(answer).rejects.toMatchObject({ status: 413 });
  });
});
