// The floor of any relay for the relay benchmark: bare ws forwarding with no parsing, no validation and no
// state. `relay PORT` forwards every frame from the client at /panel to the one at /robot and back;
// `robot URL` connects to /robot and sends every frame straight back. Each runs in a process of its own, as
// the relay and the robot do, so a tap through them crosses the same four loopback hops as a real tap.
import { WebSocket, WebSocketServer } from 'ws';

const [mode, target] = process.argv.slice(2);
process.on('SIGTERM', () => process.exit(0));

if (mode === 'relay') {
  const wss = new WebSocketServer({ port: Number(target), host: '127.0.0.1', perMessageDeflate: false });
  const peers: Record<string, WebSocket | undefined> = {};
  wss.on('connection', (ws, req) => {
    const side = req.url === '/robot' ? 'robot' : 'panel';
    const other = side === 'robot' ? 'panel' : 'robot';
    peers[side] = ws;
    ws.on('message', (data) => peers[other]?.send(data as Buffer, { binary: true }));
  });
  wss.on('listening', () => process.stdout.write('ready\n'));
} else {
  const ws = new WebSocket(`${target}/robot`, { perMessageDeflate: false });
  ws.on('message', (data) => ws.send(data as Buffer, { binary: true }));
  ws.on('open', () => process.stdout.write('ready\n'));
}
