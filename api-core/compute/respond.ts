// The JSON answer of a compute call, streamed column by column so that a million-redshift answer is
// never held as one string; Server-Timing reports the parsing and computing before the first byte.

const VALUES_PER_CHUNK = 65_536;

type Answer = { results: Record<string, unknown[] | undefined> } & Record<string, unknown>;

/** The answer's JSON text in pieces: everything but `results` at once, then each column in slices. */
function* jsonPieces(answer: Answer): Generator<string> {
  const { results, ...rest } = answer;
  const envelope = JSON.stringify(rest);
  yield `${envelope.slice(0, -1)}${envelope.length > 2 ? "," : ""}"results":{`;
  let firstColumn = true;
  for (const [name, column] of Object.entries(results)) {
    if (column === undefined) continue;
    yield `${firstColumn ? "" : ","}${JSON.stringify(name)}:[`;
    firstColumn = false;
    for (let start = 0; start < column.length; start += VALUES_PER_CHUNK) {
      yield (start > 0 ? "," : "") + JSON.stringify(column.slice(start, start + VALUES_PER_CHUNK)).slice(1, -1);
    }
    yield "]";
  }
  yield "}}";
}

export async function answerJson(work: () => Promise<Answer>): Promise<Response> {
  const started = performance.now();
  const answer = await work();
  const duration = (performance.now() - started).toFixed(1);
  const pieces = jsonPieces(answer);
  const encoder = new TextEncoder();
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      const next = pieces.next();
      if (next.done) controller.close();
      else controller.enqueue(encoder.encode(next.value));
    },
  });
  return new Response(body, { headers: { "content-type": "application/json", "server-timing": `app;dur=${duration}` } });
}
