import { describe, expect, it, vi } from "vitest";
import { markWritten, readCache } from "@/db/queries/read-cache";

// Project rules, not a published source: a cached read must never outlive a write, whatever the
// write touched; concurrent misses share one load; failures are not remembered.
describe("reads cached until the next write", () => {
  it("serves a repeat read from the cache, and reads again after any write", async () => {
    const cached = readCache<number>("test-repeat", 10);
    let value = 1;
    const load = vi.fn(async () => value);
    expect(await cached("k", load)).toBe(1);
    value = 2;
    expect(await cached("k", load)).toBe(1);
    expect(load).toHaveBeenCalledTimes(1);
    markWritten();
    expect(await cached("k", load)).toBe(2);
    expect(load).toHaveBeenCalledTimes(2);
  });

  it("keeps keys apart", async () => {
    const cached = readCache<string>("test-keys", 10);
    expect(await cached("a", async () => "A")).toBe("A");
    expect(await cached("b", async () => "B")).toBe("B");
  });

  it("shares one load between requests that miss together", async () => {
    const cached = readCache<number>("test-together", 10);
    let resolve: (n: number) => void = () => undefined;
    const load = vi.fn(() => new Promise<number>((r) => (resolve = r)));
    const first = cached("k", load);
    const second = cached("k", load);
    resolve(7);
    expect(await Promise.all([first, second])).toEqual([7, 7]);
    expect(load).toHaveBeenCalledTimes(1);
  });

  it("does not remember a failed load", async () => {
    const cached = readCache<number>("test-failure", 10);
    await expect(cached("k", async () => Promise.reject(new Error("busy")))).rejects.toThrow("busy");
    expect(await cached("k", async () => 3)).toBe(3);
  });

  it("does not keep a load that a write overtook", async () => {
    const cached = readCache<number>("test-overtaken", 10);
    let resolve: (n: number) => void = () => undefined;
    const slow = cached("k", () => new Promise<number>((r) => (resolve = r)));
    markWritten();
    resolve(1);
    expect(await slow).toBe(1);
    expect(await cached("k", async () => 2)).toBe(2);
  });

  it("holds at most `max` entries", async () => {
    const cached = readCache<number>("test-bounded", 2);
    const load = vi.fn(async () => 0);
    for (const key of ["a", "b", "c", "a"]) await cached(key, load);
    expect(load).toHaveBeenCalledTimes(4);
  });
});
