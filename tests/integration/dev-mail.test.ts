import { describe, expect, it, vi } from "vitest";
import { sendMail } from "@/lib/mail/send";
import { signInLinkMessage } from "@/lib/mail/messages";
import { CLIENT_ADDRESS_HEADER } from "@/lib/client-address";

// The address Mottle's server (scripts/serve.ts) puts on every request from the socket.
const loopback = { [CLIENT_ADDRESS_HEADER]: "127.0.0.1" };

describe("GET /api/dev/mail", () => {
  it("lists caught mail newest first, with links decoded", async () => {
    const url = "http://localhost:3000/api/auth/callback/nodemailer?token=abc%3D%3D&email=client%40demo.example&callbackUrl=%2Fclient";
    await sendMail({ to: "client@demo.example", ...signInLinkMessage({ url, host: "localhost:3000" }) });
    const { GET } = await import("@/app/api/dev/mail/route");
    const res = await GET(new Request("http://test/api/dev/mail?to=client@demo.example", { headers: loopback }), {});
    expect(res.status).toBe(200);
    const [message] = (await res.json()) as { to: string[]; subject: string; links: string[]; receivedAt: string }[];
    expect(message?.to).toEqual(["client@demo.example"]);
    expect(message?.links).toContain(url);
  });

  it("does not exist for a caller on another machine, or with no address from our server", async () => {
    const { GET } = await import("@/app/api/dev/mail/route");
    for (const headers of [{ [CLIENT_ADDRESS_HEADER]: "192.168.1.20" }, { [CLIENT_ADDRESS_HEADER]: "::ffff:10.0.0.1" }, {}] as Record<string, string>[]) {
      const res = await GET(new Request("http://test/api/dev/mail", { headers }), {});
      expect(res.status).toBe(404);
    }
  });

  it("does not exist in production", async () => {
    vi.resetModules();
    vi.stubEnv("MOTTLE_MODE", "production");
    const { GET } = await import("@/app/api/dev/mail/route");
    const res = await GET(new Request("http://test/api/dev/mail", { headers: loopback }), {});
    expect(res.status).toBe(404);
    vi.unstubAllEnvs();
  });
});
