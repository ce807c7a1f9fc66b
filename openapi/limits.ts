/**
 * Limits of the public API, enforced where a request is parsed and documented in the OpenAPI
 * document. Beyond a count limit the answer is 422, beyond a size limit 413, each saying the limit.
 */
export const LIMITS = {
  /** Redshifts in one JSON (POST) call. */
  redshiftsPerPost: 1_000_000,
  /** Values in one comma-separated query-string list (GET); a URL cannot carry much more. */
  valuesPerQuery: 1_000,
  /** Values to invert in one /redshifts call (each inversion is a root search, not a table look-up). */
  inversionsPerCall: 10_000,
  /** Bytes of a JSON request body (1e6 redshifts at full double precision take about 20 MB). */
  jsonBodyBytes: 32 * 1024 * 1024,
  /** Data rows of one uploaded CSV catalog. */
  catalogRows: 2_000_000,
  /** Bytes of a raw text/csv catalog upload (streamed, never held in memory). */
  catalogBytes: 256 * 1024 * 1024,
  /** Bytes of a multipart/form-data catalog upload (buffered by the form parser). */
  multipartBytes: 32 * 1024 * 1024,
} as const;

export const LIMITS_DESCRIPTION =
  `Limits: at most ${LIMITS.redshiftsPerPost.toLocaleString("en")} redshifts per POST call, ` +
  `${LIMITS.valuesPerQuery.toLocaleString("en")} values per comma-separated list in a GET query, ` +
  `${LIMITS.inversionsPerCall.toLocaleString("en")} values per /redshifts call, ` +
  `${LIMITS.jsonBodyBytes / 2 ** 20} MiB per JSON body; CSV catalogs: ${LIMITS.catalogRows.toLocaleString("en")} rows, ` +
  `${LIMITS.catalogBytes / 2 ** 20} MiB as a raw text/csv body, ${LIMITS.multipartBytes / 2 ** 20} MiB as multipart/form-data. ` +
  "Beyond a count limit the answer is 422, beyond a size limit 413 (application/problem+json naming the limit).";
