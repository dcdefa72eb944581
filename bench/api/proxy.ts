import { Agent, createServer, request } from 'node:http';
import type { AddressInfo } from 'node:net';

/**
 * A small round-robin HTTP proxy for the two-instance runs, in its own process: each request
 * goes to the next of the target URLs given as arguments, over kept-alive connections, body
 * and headers passed through. Prints one JSON line with its address, then serves until
 * killed. Usage: tsx bench/api/proxy.ts http://127.0.0.1:A http://127.0.0.1:B
 */
const targets = process.argv.slice(2).map((target) => new URL(target));
if (targets.length === 0) throw new Error('proxy: give one or more target URLs');
const agent = new Agent({ keepAlive: true, maxSockets: 64 });
let next = 0;

const server = createServer((incoming, outgoing) => {
  const target = targets[next++ % targets.length]!;
  const forwarded = request(
    {
      agent,
      host: target.hostname,
      port: target.port,
      method: incoming.method,
      path: incoming.url,
      headers: { ...incoming.headers, host: target.host },
    },
    (answer) => {
      outgoing.writeHead(answer.statusCode ?? 502, answer.headers);
      answer.pipe(outgoing);
    },
  );
  forwarded.on('error', () => {
    if (!outgoing.headersSent) outgoing.writeHead(502);
    outgoing.end();
  });
  incoming.pipe(forwarded);
});
server.keepAliveTimeout = 60_000;
server.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  process.stdout.write(`${JSON.stringify({ url: `http://127.0.0.1:${port}` })}\n`);
});
process.on('SIGTERM', () => process.exit(0));
process.on('SIGINT', () => process.exit(0));
