import { describe, expect, it } from "vitest";
import { answerJson } from "@/api-core/compute/respond";

describe("answerJson", () => {
  it("streams JSON equal to the answer, long columns and nested lists included", async () => {
    const long = Array.from({ length: 200_000 }, (_, i) => (i % 3 === 0 ? null : i / 7));
    const answer = { cosmology: { ref: null, hash: "sha256:x" }, results: { z: long, lists: [[1, 2], [], [3]], empty: [] as number[], absent: undefined }, turnaround: null };
    const response = await answerJson(async () => answer);
    expect(response.headers.get("content-type")).toBe("application/json");
    expect(response.headers.get("server-timing")).toMatch(/^app;dur=\d/);
    const { absent: _, ...results } = answer.results;
    expect(JSON.parse(await response.text())).toEqual({ ...answer, results });
  });
});
