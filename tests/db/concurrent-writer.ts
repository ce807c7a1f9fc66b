// One writer process for the durability test: inserts COUNT audit rows as fast as it can through the
// shared write queue, and prints how many inserts were acknowledged.
import { write } from "@/db/client";
import { auditTrail } from "@/db/schema";

const writer = process.argv[2];
const count = Number(process.argv[3]);
let acknowledged = 0;
await Promise.all(
  Array.from({ length: count }, (_, n) =>
    write((d) => d.insert(auditTrail).values({ at: Date.now(), action: "probe.write", targetType: "probe", targetId: writer, detail: { n } }))
      .then(() => acknowledged++)
      .catch((error) => console.error(`write ${n} failed: ${error}`)),
  ),
);
console.log(JSON.stringify({ writer, acknowledged }));
