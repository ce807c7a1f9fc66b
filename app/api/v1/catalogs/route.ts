import { catalog } from "@/api-core/compute/catalog";
import { queryToObject } from "@/api-core/compute/input";
import { catalogUpload } from "@/api-core/http/csv";
import { withKey } from "@/api-core/http/guard";
import { CatalogQuery, DEFAULT_CATALOG_QUANTITIES } from "@/openapi/catalogs";
import { LIMITS } from "@/openapi/limits";

export const dynamic = "force-dynamic";

export const POST = withKey(
  async (call) => {
    const query = CatalogQuery.parse(queryToObject(call.url.searchParams, CatalogQuery, LIMITS.valuesPerQuery));
    return catalog(query, DEFAULT_CATALOG_QUANTITIES, () => catalogUpload(call.request, LIMITS), call, LIMITS.catalogRows);
  },
  { scope: "compute" },
);
