// One instance of the shared-burst test: COUNT calls against one key's per-minute limit; prints how many were allowed.
import { consumeBurst } from "@/api-core/quota/burst";

const [keyId, perMinute, count] = [process.argv[2], Number(process.argv[3]), Number(process.argv[4])];
let allowed = 0;
for (let i = 0; i < count; i++) if ((await consumeBurst(keyId, perMinute)).allowed) allowed++;
console.log(JSON.stringify({ allowed }));
process.exit(0);
