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

// Drill channels (the drills issue): coaches send calls like leads and programmers; operators answer them.
const DRILL_TABLE = [
  ['lead', true, true],
  ['programmer', true, true],
  ['operator', false, true],
  ['coach', true, true],
  ['viewer', false, false],
  ['robot', false, false],
] as const;

describe('canPublish on drill channels', () => {
  it.each(DRILL_TABLE)('%s: op/drill/call %s, op/drill/answer %s', (role, call, answer) => {
    expect(canPublish(role, 'op/drill/call')).toBe(call);
    expect(canPublish(role, 'op/drill/answer')).toBe(answer);
  });

  it('leaves coaches out of the other op/ channels', () => {
    expect(canPublish('coach', 'op/reef/level')).toBe(false);
    expect(canPublish('coach', 'op/drillcall')).toBe(false);
  });
});
