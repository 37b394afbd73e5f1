import { createServer } from "node:http";
import next from "next";
import { CLIENT_ADDRESS_HEADER } from "../lib/client-address";
import { refuseAtEdge, resolveClientAddress, untrustedForwardHeaders } from "../lib/server/edge";

/**
 * Mottle's HTTP server: Next.js's request handler behind a few lines that only a server sees.
 * It works out the caller's real address from the socket (and TRUSTED_PROXY_HOPS), drops any
 * X-Forwarded-* or address header a client sent when no proxy is trusted, and refuses broken
 * paths and oversized bodies before routing. `npm start`, the demo and the tests all run this.
 *
 *   tsx scripts/serve.ts [--dev] [--port 3000] [--hostname 127.0.0.1]
 */
const args = process.argv.slice(2);
const option = (name: string) => {
  const at = args.indexOf(`--${name}`);
  return at >= 0 ? args[at + 1] : undefined;
};
const dev = args.includes("--dev");
const port = Number(option("port") ?? process.env.PORT ?? 3000);
// Loopback unless told otherwise: a demo or dev server is not for the network.
const hostname = option("hostname") ?? process.env.HOST ?? "127.0.0.1";
const hops = Number(process.env.TRUSTED_PROXY_HOPS ?? 0);
process.env.PORT = String(port);

const app = next({ dev, hostname, port });
await app.prepare();
const handle = app.getRequestHandler();

const server = createServer((req, res) => {
  const refusal = refuseAtEdge(req.url, req.headers["content-length"], req.headers["content-type"]);
  if (refusal) {
    res.writeHead(refusal.status, { "content-type": "application/json", connection: "close" });
    res.end(JSON.stringify({ error: refusal.error }));
    // Read and drop whatever body follows, so the caller gets the answer instead of a reset connection.
    req.resume();
    return;
  }
  const address = resolveClientAddress(req.socket.remoteAddress, headerText(req.headers["x-forwarded-for"]), hops);
  for (const name of untrustedForwardHeaders(hops)) delete req.headers[name];
  req.headers[CLIENT_ADDRESS_HEADER] = address;
  void handle(req, res);
});

server.listen(port, hostname, () => {
  console.log(`Mottle listening on http://${hostname}:${port}${dev ? " (development)" : ""}`);
});

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => {
    server.close();
    // Requests in flight get a moment to finish; then the process goes whatever they are doing.
    setTimeout(() => process.exit(0), 2000).unref();
    void app.close().finally(() => process.exit(0));
  });
}

function headerText(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value.join(",") : value;
}
