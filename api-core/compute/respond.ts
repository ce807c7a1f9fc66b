/** A JSON answer with a Server-Timing header covering the work and its serialization. */
export async function answerJson(work: () => Promise<unknown>, status = 200): Promise<Response> {
  const started = performance.now();
  const body = JSON.stringify(await work());
  const duration = (performance.now() - started).toFixed(1);
  return new Response(body, {
    status,
    headers: { "content-type": "application/json", "server-timing": `app;dur=${duration}` },
  });
}
