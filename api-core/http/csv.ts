// CSV catalog streaming: parse the upload chunk by chunk with papaparse, compute a batch at a time, and
// write the answer out through a pull-driven ReadableStream, so memory stays flat however many rows.
import Papa from "papaparse";
import { tooLarge } from "@/api-core/compute/input";
import { ProblemError } from "./problem";

const BATCH_ROWS = 4096;
const NEWLINE = "\r\n"; // RFC 4180

export interface UploadLimits {
  catalogBytes: number;
  multipartBytes: number;
}

/** `stream`, failing with 413 once more than `maxBytes` have passed; `exceeded()` tells whether it did. */
function limitBytes(stream: ReadableStream<Uint8Array>, maxBytes: number) {
  let bytes = 0;
  const limited = stream.pipeThrough(
    new TransformStream<Uint8Array, Uint8Array>({
      transform(chunk, controller) {
        bytes += chunk.byteLength;
        if (bytes > maxBytes) controller.error(tooLarge(maxBytes));
        else controller.enqueue(chunk);
      },
    }),
  );
  return { stream: limited, exceeded: () => bytes > maxBytes };
}

/** The CSV bytes of an upload: a raw text/csv body (streamed) or the `file` field of a multipart form. */
export async function catalogUpload(request: Request, limits: UploadLimits): Promise<ReadableStream<Uint8Array>> {
  const type = request.headers.get("content-type") ?? "";
  const declared = Number(request.headers.get("content-length"));
  const empty = () => new ProblemError(422, "empty-catalog", "The catalog is empty: send a header row and at least one data row.");
  if (/^multipart\/form-data\b/i.test(type)) {
    if (declared > limits.multipartBytes) throw tooLarge(limits.multipartBytes);
    if (!request.body) throw empty();
    // The form parser buffers the whole body, hence the smaller limit for multipart uploads.
    const body = limitBytes(request.body, limits.multipartBytes);
    let form: FormData;
    try {
      form = await new Response(body.stream, { headers: { "content-type": type } }).formData();
    } catch {
      if (body.exceeded()) throw tooLarge(limits.multipartBytes);
      throw new ProblemError(400, "malformed-multipart", "The multipart/form-data body could not be read; send the CSV as the field named file.");
    }
    const file = form.get("file");
    if (!(file instanceof Blob)) throw new ProblemError(422, "missing-file", "Send the CSV as the multipart field named file (e.g. curl -F file=@catalog.csv).");
    return file.stream();
  }
  if (/^(text\/csv|application\/csv)\b/i.test(type)) {
    if (declared > limits.catalogBytes) throw tooLarge(limits.catalogBytes);
    if (!request.body) throw empty();
    return limitBytes(request.body, limits.catalogBytes).stream;
  }
  throw new ProblemError(415, "unsupported-media-type", `Send the catalog as Content-Type: text/csv, or as the file field of multipart/form-data (got ${type || "none"}).`);
}

export interface CatalogPlan {
  zColumn: string;
  /** Columns added after the input columns, before `error`. */
  quantities: readonly string[];
  rowLimit: number;
  /** The requested quantities at each z of a batch (one array per quantity); charges before computing. */
  compute(z: Float64Array): Promise<Float64Array[]>;
}

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Why a row cannot be computed, or null when its redshift is usable. */
function rowProblem(row: string[], width: number, zIndex: number, zColumn: string): string | null {
  if (row.length !== width) return `expected ${width} fields as in the header, found ${row.length}`;
  const text = row[zIndex].trim();
  if (text === "") return `${zColumn} is empty`;
  if (!DECIMAL.test(text)) return `${zColumn} is not a number: ${text}`;
  const z = Number(text);
  if (!Number.isFinite(z)) return `${zColumn} is out of range: ${text}`;
  if (z < 0) return `${zColumn} is negative (${text}); redshifts must be ≥ 0`;
  return null;
}

/** A field as RFC 4180 writes it: quoted (quotes doubled) when it holds a comma, a quote or a line break. */
function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function formatNumber(value: number): string {
  return Number.isFinite(value) ? String(value) : "";
}

/** Index of the last newline outside quotes (RFC 4180 doubles a quote inside a field, so parity tells), or −1. */
function lastRecordEnd(text: string): number {
  let inQuotes = false;
  let last = -1;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 34) inQuotes = !inQuotes;
    else if (c === 10 && !inQuotes) last = i;
  }
  return last;
}

/**
 * Rows of the upload as it arrives: each network chunk is cut at its last complete record and that
 * text parsed with papaparse, so only one chunk and an incomplete last record are ever held.
 */
function csvRows(source: ReadableStream<Uint8Array>) {
  const reader = source.getReader();
  const decoder = new TextDecoder();
  let pending = "";
  let rows: string[][] = [];
  let done = false;
  const parse = (text: string) => Papa.parse<string[]>(text, { skipEmptyLines: true }).data;
  return {
    /** Up to `count` rows; fewer only at the end of the upload. */
    async take(count: number): Promise<string[][]> {
      while (rows.length < count && !done) {
        const chunk = await reader.read();
        if (chunk.done) {
          done = true;
          pending += decoder.decode();
          if (pending) rows = rows.concat(parse(pending));
          pending = "";
          break;
        }
        pending += decoder.decode(chunk.value, { stream: true });
        const end = lastRecordEnd(pending);
        if (end >= 0) {
          rows = rows.concat(parse(pending.slice(0, end + 1)));
          pending = pending.slice(end + 1);
        }
      }
      return rows.splice(0, count);
    },
    close() {
      done = true;
      reader.cancel().catch(() => undefined);
    },
  };
}

/**
 * Starts streaming the answer CSV. The header and first batch are read and computed before this
 * returns, so a missing z column or a quota refusal on the first batch is still a problem+json answer.
 */
export async function streamCatalog(source: ReadableStream<Uint8Array>, plan: CatalogPlan): Promise<ReadableStream<Uint8Array>> {
  const upload = csvRows(source);
  const close = () => upload.close();

  const [first] = await upload.take(1);
  if (!first) {
    close();
    throw new ProblemError(422, "empty-catalog", "The catalog is empty: send a header row and at least one data row.");
  }
  const header = first.map((name, i) => (i === 0 ? name.replace(/^\uFEFF/, "") : name));
  const zIndex = header.indexOf(plan.zColumn);
  if (zIndex < 0) {
    close();
    throw new ProblemError(422, "missing-z-column", `The header has no column ${plan.zColumn}; its columns are ${header.join(", ")}. Name the redshift column with zColumn=<name>.`, {
      errors: [{ parameter: "zColumn", message: `no column ${plan.zColumn}` }],
    });
  }
  const clash = [...plan.quantities, "error"].find((name) => header.includes(name));
  if (clash) {
    close();
    throw new ProblemError(422, "column-clash", `The catalog already has a column named ${clash}, which the answer adds; rename it in the upload.`);
  }

  let rowCount = 0;
  async function nextBatch(): Promise<string[][]> {
    const batch = await upload.take(BATCH_ROWS);
    rowCount += batch.length;
    if (rowCount > plan.rowLimit) throw new ProblemError(413, "too-many-rows", `The catalog has more than ${plan.rowLimit} rows; split it.`, { limit: plan.rowLimit });
    return batch;
  }

  const emptyValues = plan.quantities.map(() => "").join(",");
  async function render(batch: string[][]): Promise<string> {
    const problems = batch.map((row) => rowProblem(row, header.length, zIndex, plan.zColumn));
    const usable = batch.flatMap((row, i) => (problems[i] === null ? [Number(row[zIndex])] : []));
    const values = usable.length ? await plan.compute(Float64Array.from(usable)) : [];
    let text = "";
    for (let i = 0, k = 0; i < batch.length; i++) {
      const row = batch[i];
      // A short row is padded so that every answer row has the header's width; extra fields are left out (and said so).
      let line = csvField(row[0] ?? "");
      for (let j = 1; j < header.length; j++) line += "," + csvField(row[j] ?? "");
      const problem = problems[i];
      if (problem !== null) {
        line += "," + emptyValues + "," + csvField(row.length > header.length ? `${problem}; the extra fields are left out` : problem);
      } else {
        for (const column of values) line += "," + formatNumber(column[k]);
        line += ",";
        k++;
      }
      text += line + NEWLINE;
    }
    return text;
  }

  const encoder = new TextEncoder();
  let head: string;
  try {
    const batch = await nextBatch();
    head = [...header, ...plan.quantities, "error"].map(csvField).join(",") + NEWLINE + (batch.length ? await render(batch) : "");
  } catch (error) {
    close();
    throw error;
  }
  return new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(encoder.encode(head));
    },
    async pull(controller) {
      try {
        const batch = await nextBatch();
        if (batch.length === 0) controller.close();
        else controller.enqueue(encoder.encode(await render(batch)));
      } catch (error) {
        // The 200 status has left already: a transfer error is the only honest way to stop.
        close();
        controller.error(error);
      }
    },
    cancel: close,
  });
}
