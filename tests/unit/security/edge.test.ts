import { describe, expect, it } from "vitest";
import { isLoopback, MAX_REQUEST_BYTES, refuseAtEdge, resolveClientAddress, untrustedForwardHeaders } from "@/lib/server/edge";

// X-Forwarded-For: each proxy appends the address it received the request from (common practice,
// the de-facto header; RFC 7239 §5.2 describes the same chain for Forwarded). Only the entries
// added by proxies we trust can be believed; anything further left is the client's to write.
describe("the caller's address", () => {
  it("is the socket's peer when no proxy is trusted, whatever X-Forwarded-For says", () => {
    expect(resolveClientAddress("203.0.113.7", "198.51.100.1", 0)).toBe("203.0.113.7");
    expect(resolveClientAddress("::ffff:203.0.113.7", undefined, 0)).toBe("203.0.113.7");
  });

  it("is the entry the trusted proxies added, never one the client wrote", () => {
    // client 203.0.113.7 forges "1.2.3.4"; the one proxy (socket 10.0.0.2) appends the real peer.
    expect(resolveClientAddress("10.0.0.2", "1.2.3.4, 203.0.113.7", 1)).toBe("203.0.113.7");
    // two proxies: client → CDN (appends client) → load balancer (appends CDN) → us
    expect(resolveClientAddress("10.0.0.3", "9.9.9.9, 203.0.113.7, 10.0.0.9", 2)).toBe("203.0.113.7");
    // fewer entries than hops: the leftmost one there is
    expect(resolveClientAddress("10.0.0.2", undefined, 1)).toBe("10.0.0.2");
  });

  it("drops forwarded headers only when no proxy is trusted", () => {
    expect(untrustedForwardHeaders(0)).toEqual(expect.arrayContaining(["x-forwarded-for", "x-forwarded-host", "x-forwarded-proto", "forwarded"]));
    expect(untrustedForwardHeaders(1)).toEqual([]);
  });

  it("knows loopback callers", () => {
    expect(isLoopback("127.0.0.1")).toBe(true);
    expect(isLoopback("::1")).toBe(true);
    expect(isLoopback("192.168.1.5")).toBe(false);
  });
});

describe("requests refused before routing", () => {
  it("answers 400 for a broken percent-encoding in the path (RFC 3986 §2.1)", () => {
    expect(refuseAtEdge("/api/boards/%E0%A4%A", undefined)?.status).toBe(400);
    expect(refuseAtEdge("/api/boards/%ZZ", undefined)?.status).toBe(400);
    expect(refuseAtEdge("/api/boards/%E0%A4%A4?x=%ZZ", undefined)).toBeNull();
  });

  it("answers 413 for a declared body over the limit (RFC 9110 §15.5.14)", () => {
    expect(refuseAtEdge("/api/uploads", String(MAX_REQUEST_BYTES + 1))?.status).toBe(413);
    expect(refuseAtEdge("/api/uploads", String(MAX_REQUEST_BYTES))).toBeNull();
  });
});

describe("JSON bodies at the edge", () => {
  it("refuses a declared JSON body past the JSON limit, whatever the charset parameter", async () => {
    const { MAX_JSON_BYTES } = await import("@/lib/server/edge");
    expect(refuseAtEdge("/api/finishes", String(MAX_JSON_BYTES + 1), "application/json; charset=utf-8")?.status).toBe(413);
    expect(refuseAtEdge("/api/finishes", String(MAX_JSON_BYTES), "application/json")).toBeNull();
    expect(refuseAtEdge("/api/uploads", String(MAX_JSON_BYTES + 1), "multipart/form-data; boundary=x")).toBeNull();
  });
});
