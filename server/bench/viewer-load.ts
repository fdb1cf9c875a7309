// A separate process of relay viewers for the relay benchmark, so their decoding does not share a CPU
// with the panel and robot being timed. Prints one JSON line with each viewer's telemetry count on exit.
import { parseArgs } from 'node:util';
import { WebSocket } from 'ws';
import { encodeFrame } from '../../shared/protocol/frame-codec';
import { RelayLink, WATCHER_LINK_TIMING, type SocketLike } from '../../shared/protocol/relay-link';

const { values } = parseArgs({
  options: {
    url: { type: 'string' },
    cookie: { type: 'string' },
    origin: { type: 'string' },
    viewers: { type: 'string', default: '20' },
    stuck: { type: 'string', default: '0' },
  },
});
const url = values.url!;
const headers = { cookie: values.cookie!, origin: values.origin! };
const counts = Array.from({ length: Number(values.viewers) }, () => 0);
const links = counts.map(
  (_, i) =>
    new RelayLink(
      {
        connect: () => new WebSocket(url, { headers, perMessageDeflate: false }) as unknown as SocketLike,
        now: () => performance.timeOrigin + performance.now(),
        setTimer: (fn, ms) => setTimeout(fn, ms),
        clearTimer: (h) => clearTimeout(h as NodeJS.Timeout),
        random: Math.random,
      },
      // Timed as the app's live page is.
      { hello: { kind: 'viewer', name: `load viewer ${i}` }, ...WATCHER_LINK_TIMING },
      {
        onOpen: () => links[i]!.send({ type: 'subscribe', prefixes: ['robot/', 'op/'] }),
        onMessage: (m) => {
          if (m.type === 'telemetry_batch') counts[i]! += 1;
        },
      },
    ),
);
for (const link of links) link.start();

// A stuck viewer: says hello, subscribes, then never reads again.
for (let i = 0; i < Number(values.stuck); i += 1) {
  const ws = new WebSocket(url, { headers, perMessageDeflate: false });
  ws.once('open', () => {
    ws.send(encodeFrame({ type: 'hello', v: 1, kind: 'viewer', name: 'stuck viewer' }));
    ws.send(encodeFrame({ type: 'subscribe', prefixes: ['robot/'] }));
    setTimeout(() => (ws as unknown as { _socket: { pause(): void } })._socket.pause(), 200);
  });
}

const ready = setInterval(() => {
  if (links.every((l) => l.status === 'open')) {
    clearInterval(ready);
    process.stdout.write('ready\n');
  }
}, 20);

process.stdin.setEncoding('utf8');
process.stdin.on('data', (text: string) => {
  if (text.includes('reset')) counts.fill(0);
  if (text.includes('report')) process.stdout.write(`${JSON.stringify({ counts })}\n`);
  if (text.includes('quit')) process.exit(0);
});
