// /catalogs: a validated query and an upload stream → the streamed CSV answer with its cosmology headers.
import { ENGINE_VERSION, type CosmologyInput } from "@/api-core/cosmology";
import { streamCatalog } from "@/api-core/http/csv";
import { begin, type Metering, type UnitSelection } from "./envelope";
import { computeQuantities, describeUnits } from "./quantities";

export interface CatalogRequest extends Partial<CosmologyInput>, UnitSelection {
  cosmology?: string;
  zColumn?: string;
  quantities?: readonly string[];
}

export async function catalog(query: CatalogRequest, defaultQuantities: readonly string[], upload: () => Promise<ReadableStream<Uint8Array>>, meter: Metering, rowLimit: number): Promise<Response> {
  const { cosmology, units } = await begin(query, meter, 0);
  const quantities = query.quantities ?? defaultQuantities;
  const body = await streamCatalog(await upload(), {
    zColumn: query.zColumn ?? "z",
    quantities,
    rowLimit,
    async compute(z) {
      await meter.charge(z.length);
      return computeQuantities(cosmology.model, quantities, z, units);
    },
  });
  return new Response(body, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "comova-cosmology-hash": cosmology.hash,
      "comova-cosmology-ref": cosmology.ref ?? "inline",
      "comova-engine-version": ENGINE_VERSION,
      "comova-units": describeUnits(quantities, units),
    },
  });
}
