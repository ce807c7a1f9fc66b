// One process of the quota exactness test: tries COUNT one-unit charges at once against one key and
// prints how many were granted.
import { chargeUnits } from "@/api-core/quota/monthly";

const [keyId, limit, count] = [process.argv[2], Number(process.argv[3]), Number(process.argv[4])];
const results = await Promise.all(Array.from({ length: count }, () => chargeUnits(keyId, limit, 1)));
console.log(JSON.stringify({ granted: results.filter((r) => r.charged).length }));
