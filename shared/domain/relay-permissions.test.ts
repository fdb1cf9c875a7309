import { describe, expect, it } from 'vitest';
import { canPublish, canSubscribe } from './relay-permissions';

// Written out from the product brief's role table (../shared/PRODUCT.md): only operators, programmers and
// leads publish op/*; only robot keys publish robot/*; coaches and viewers read.
const TABLE = [
  ['lead', true, false],
  ['programmer', true, false],
  ['operator', true, false],
  ['coach', false, false],
  ['viewer', false, false],
  ['robot', false, true],
] as const;

describe('canPublish', () => {
  it.each(TABLE)('%s: op/* %s, robot/* %s, sys/* never', (role, op, robot) => {
    expect(canPublish(role, 'op/reef/branch')).toBe(op);
    expect(canPublish(role, 'robot/mode')).toBe(robot);
    expect(canPublish(role, 'sys/clients')).toBe(false);
  });
});

describe('canSubscribe', () => {
  it('lets people read every prefix and a robot only op/ and sys/', () => {
    expect(canSubscribe('viewer', 'robot/')).toBe(true);
    expect(canSubscribe('coach', 'op/')).toBe(true);
    expect(canSubscribe('robot', 'op/')).toBe(true);
    expect(canSubscribe('robot', 'robot/')).toBe(false);
  });
});
