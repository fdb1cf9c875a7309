// The raw baseline of the relay benchmark: a bare ws echo server in a process of its own, as the relay is.
import { WebSocketServer } from 'ws';

const wss = new WebSocketServer({ port: Number(process.argv[2]), host: '127.0.0.1', perMessageDeflate: false });
wss.on('connection', (ws) => ws.on('message', (data) => ws.send(data as Buffer, { binary: true })));
wss.on('listening', () => process.stdout.write('ready\n'));
process.on('SIGTERM', () => process.exit(0));
