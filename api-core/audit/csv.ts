import Papa from "papaparse";

/** Streams pages of rows as RFC 4180 CSV (header first, CRLF line ends), one page at a time. */
export function csvStream<Row extends object>(columns: (keyof Row & string)[], pages: AsyncIterable<Row[]>): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder();
  const iterator = pages[Symbol.asyncIterator]();
  let headerSent = false;
  return new ReadableStream({
    async pull(controller) {
      if (!headerSent) {
        headerSent = true;
        controller.enqueue(encoder.encode(Papa.unparse([columns], { newline: "\r\n" }) + "\r\n"));
        return;
      }
      const next = await iterator.next();
      if (next.done) return controller.close();
      const data = next.value.map((row) => columns.map((column) => (row as Record<string, unknown>)[column] ?? ""));
      controller.enqueue(encoder.encode(Papa.unparse({ fields: columns, data }, { header: false, newline: "\r\n", escapeFormulae: true }) + "\r\n"));
    },
  });
}
