// Schemas of /api/v1/catalogs: a CSV catalog in, the same rows with computed columns out.
import { checkCosmologySelection, cosmologySelectionShape, unitShape } from "./common";
import { LIMITS, LIMITS_DESCRIPTION } from "./limits";
import { BEARER, problemResponses } from "./responses";
import { registry } from "./registry";
import { z } from "./zod";

/** Result columns of the other endpoints that a catalog can ask for, with the unit each is written in. */
export const CATALOG_QUANTITIES = [
  "comovingDistance",
  "transverseComovingDistance",
  "angularDiameterDistance",
  "luminosityDistance",
  "distanceModulus",
  "lightTravelDistance",
  "lookbackTime",
  "age",
  "scale",
  "hubbleParameter",
  "omegaM",
  "omegaDE",
  "omegaR",
  "omegaK",
  "criticalDensity",
  "comovingVolume",
  "differentialComovingVolume",
] as const;

export const DEFAULT_CATALOG_QUANTITIES = ["comovingDistance", "luminosityDistance", "angularDiameterDistance", "distanceModulus", "lookbackTime"] as const;

export const CatalogQuery = z
  .strictObject({
    zColumn: z.string().min(1).optional().openapi({ description: "Header name of the redshift column. Default z.", example: "z" }),
    quantities: z
      .array(z.enum(CATALOG_QUANTITIES))
      .min(1, "ask for at least one quantity")
      .optional()
      .openapi({
        description: `Columns to add, comma-separated, named as in the other endpoints' results (comovingVolume: whole sky from 0 to z). Default ${DEFAULT_CATALOG_QUANTITIES.join(",")}.`,
        example: ["comovingDistance", "luminosityDistance"],
        param: { style: "form", explode: false },
      }),
    ...cosmologySelectionShape,
    ...unitShape,
  })
  .superRefine(checkCosmologySelection)
  .openapi("CatalogQuery");

const csvBody = z.string().openapi({
  description: "RFC 4180 CSV with a header row.",
  example: "id,z\ngal-001,0.12\ngal-002,0.57\ngal-003,not-measured\n",
});

registry.registerPath({
  method: "post",
  path: "/api/v1/catalogs",
  operationId: "computeCatalog",
  tags: ["catalogs"],
  summary: "Compute columns for a CSV catalog",
  description:
    "Upload a CSV catalog as the raw body (Content-Type: text/csv, streamed) or as the `file` field of multipart/form-data. " +
    "The answer is the same CSV, streamed row by row: every input column, then the requested quantities, then `error`. " +
    "Rows that cannot be computed (z not a number, negative, or a wrong number of fields) are kept and flagged in `error`, never dropped. " +
    "One evaluation unit is charged per computed row. Because CSV has no envelope, the cosmology and engine are reported in the " +
    "Comova-Cosmology-Hash, Comova-Cosmology-Ref, Comova-Engine-Version and Comova-Units headers.\n\n" +
    `A body larger than its limit is answered 413 when its Content-Length says so. A catalog of more than ${LIMITS.catalogRows} rows ` +
    "(or a body without Content-Length that grows past the limit) is cut off where the limit is reached, with a transfer error, " +
    "since the 200 status has left by then.\n\n" +
    LIMITS_DESCRIPTION,
  security: [{ [BEARER]: [] }],
  request: {
    query: CatalogQuery,
    body: {
      required: true,
      content: {
        "text/csv": { schema: csvBody },
        "multipart/form-data": { schema: z.object({ file: z.string().openapi({ format: "binary", description: "The CSV file." }) }) },
      },
    },
  },
  responses: {
    "200": {
      description: "The catalog with the computed columns and an `error` column.",
      headers: {
        "Comova-Cosmology-Hash": { description: "sha256 of the resolved parameters.", schema: { type: "string" } },
        "Comova-Cosmology-Ref": { description: "slug@version, or `inline`.", schema: { type: "string" } },
        "Comova-Engine-Version": { description: "Engine version.", schema: { type: "string" } },
        "Comova-Units": { description: "Units of the added columns, e.g. distance=Mpc, time=Gyr.", schema: { type: "string" } },
      },
      content: { "text/csv": { schema: z.string().openapi({ example: "id,z,comovingDistance,error\r\ngal-001,0.12,…,\r\ngal-003,not-measured,,z is not a number: not-measured\r\n" }) } },
    },
    ...problemResponses([401, 403, 404, 413, 415, 422, 429]),
  },
});

