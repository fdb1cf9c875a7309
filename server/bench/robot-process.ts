// The relay benchmark's robot in a process of its own, as a real robot is: it acknowledges every new op/
// value and, on "stream", sends 200 signals at 50 Hz in batches of 5 ticks. Answers "report" with the
// number of batches sent; "quit" ends it.
import { parseArgs } from 'node:util';
import type { Signal } from '../../shared/protocol/messages';
import { RobotClient } from '../../simulator/src/robot-client';

const { values } = parseArgs({ options: { url: { type: 'string' }, key: { type: 'string' } } });
const SIGNALS: Signal[] = Array.from({ length: 200 }, (_, index) => ({ index, name: `load/s${index}`, type: 'number', unit: '' }));

const robot = new RobotClient({
  url: values.url!,
  key: values.key!,
  name: 'Gullwing bench',
  onValue: (channel, _value, rev, retained) => {
    if (!retained) robot.ack(channel, rev);
  },
});
robot.start();

let tick = 0;
let sent = 0;
let timer: NodeJS.Timeout | undefined;
const ready = setInterval(() => {
  if (robot.status !== 'open') return;
  clearInterval(ready);
  robot.declareSignals(SIGNALS);
  process.stdout.write('ready\n');
}, 10);

process.stdin.setEncoding('utf8');
process.stdin.on('data', (text: string) => {
  if (text.includes('stream') && !timer) {
    timer = setInterval(() => {
      const rows = Array.from({ length: 5 }, () => {
        tick += 1;
        return Array.from({ length: 200 }, (_, i) => Math.sin(tick / 10 + i) * 100);
      });
      robot.sendTelemetry(rows, tick * 20, 20);
      sent += 1;
    }, 100);
  }
  if (text.includes('halt')) clearInterval(timer);
  if (text.includes('report')) process.stdout.write(`${JSON.stringify({ sent })}\n`);
  if (text.includes('quit')) {
    robot.stop();
    process.exit(0);
  }
});
