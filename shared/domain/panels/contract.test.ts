import { describe, expect, it } from 'vitest';
import type { PanelDocument, Tile, TileKind, TileOf } from '../../schemas/panel';
import { BRANCH_LETTERS } from '../channels';
import {
  channelContract,
  channelContractFileSchema,
  constantName,
  contractJava,
  contractJson,
  contractPython,
  JAVA_RESERVED,
  PYTHON_RESERVED,
  typeName,
} from './contract';
import { DEFAULT_PANEL_THEME, TILE_CATALOGUE } from './tile-catalogue';

function tile<K extends TileKind>(kind: K, id: string, patch: Partial<TileOf<K>> = {}): TileOf<K> {
  return { ...TILE_CATALOGUE[kind].create(id, { x: 0, y: 0 }), ...patch };
}

function doc(...pages: Tile[][]): PanelDocument {
  return {
    device: { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' },
    grid: { columns: 16, rows: 10, gapPx: 8 },
    theme: DEFAULT_PANEL_THEME,
    pages: pages.map((tiles, i) => ({ id: `p${i}`, name: `Page ${i + 1}`, tiles })),
  };
}

const matchPanel = doc(
  [
    tile('reef-picker', 'reef'),
    tile('level-picker', 'level'),
    tile('choice-pad', 'auto', {
      options: [
        { label: 'Leave', value: 'leave' },
        { label: '3 piece', value: '3-piece' },
        { label: 'All', value: 'all' },
        { label: 'Values', value: 'values' },
      ],
    }),
    tile('push-pad', 'eject'),
    tile('target-echo', 'echo'),
    tile('readout', 'volts'),
    tile('lamp', 'coral'),
    tile('caption', 'title'),
  ],
  [tile('level-picker', 'level-2', { label: 'Level again' }), tile('match-clock', 'clock')],
);

describe('channelContract', () => {
  const contract = channelContract(matchPanel);

  it('lists what the panel writes, sorted, with types, values and the tiles', () => {
    expect(contract.writes.map((c) => [c.channel, c.type])).toEqual([
      ['op/auto/routine', 'string'],
      ['op/intake/eject', 'boolean'],
      ['op/reef/branch', 'string'],
      ['op/reef/level', 'string'],
    ]);
    expect(contract.writes.find((c) => c.channel === 'op/reef/branch')!.values).toEqual([...BRANCH_LETTERS]);
    expect(contract.writes.find((c) => c.channel === 'op/reef/level')).toEqual({
      channel: 'op/reef/level',
      type: 'string',
      values: ['L4', 'L3', 'L2', 'L1'],
      tiles: [
        { id: 'level', label: 'Level', kind: 'level-picker' },
        { id: 'level-2', label: 'Level again', kind: 'level-picker' },
      ],
    });
    expect(contract.writes.find((c) => c.channel === 'op/intake/eject')!.values).toBeUndefined();
  });

  it('lists what it reads; an echo of a written channel takes the writer’s type', () => {
    expect(contract.reads.map((c) => [c.channel, c.type])).toEqual([
      ['op/reef/branch', 'string'],
      ['op/reef/level', 'string'],
      ['robot/battery/voltage', 'number'],
      ['robot/intake/coral-sensor', 'boolean'],
      ['robot/match/remaining', 'number'],
    ]);
    expect(contract.reads[1]!.values).toEqual(['L4', 'L3', 'L2', 'L1']);
    expect(contract.reads[1]!.tiles).toEqual([{ id: 'echo', label: 'Target', kind: 'target-echo' }]);
  });

  it('uses the standard values for an echoed op/ channel nobody on the panel writes', () => {
    const alone = channelContract(doc([tile('target-echo', 'echo', { channels: ['op/cage'] })]));
    expect(alone).toEqual({ writes: [], reads: [{ channel: 'op/cage', type: 'string', values: ['none', 'park', 'shallow', 'deep'], tiles: [{ id: 'echo', label: 'Target', kind: 'target-echo' }] }] });
  });

  it('notes the other types when tiles disagree on a channel, in the code comments too', () => {
    const clash = channelContract(doc([tile('level-picker', 'level'), tile('push-pad', 'quick', { channel: 'op/reef/level', label: 'Quick L4' })]));
    expect(clash.writes[0]).toMatchObject({ channel: 'op/reef/level', type: 'string', otherTypes: ['boolean'] });
    expect(contractJava(clash)).toContain('/** string, one of L4, L3, L2, L1 (CLASH: also written as boolean; fix the panel); written by "Level" (level picker), "Quick L4" (push pad). */');
    expect(contractPython(clash)).toContain('# string, one of L4, L3, L2, L1 (CLASH: also written as boolean; fix the panel); written by');
  });

  it('merges the value sets of pickers on one channel and skips empty channels', () => {
    const mixed = channelContract(doc([tile('level-picker', 'a', { options: [{ label: 'L4', value: 'L4' }] }), tile('level-picker', 'b', { options: [{ label: 'L1', value: 'L1' }, { label: 'L4', value: 'L4' }] }), tile('lamp', 'c', { channel: '' })]));
    expect(mixed.writes[0]!.values).toEqual(['L4', 'L1']);
    expect(mixed.reads).toEqual([]);
  });
});

describe('contractJson', () => {
  it('is a pretty, versioned file that parses back', () => {
    const text = contractJson(channelContract(matchPanel), 'Gullwing match panel');
    expect(text.startsWith('{\n  "format": "pitwall.channel-contract",\n  "version": 1,\n  "panel": "Gullwing match panel",')).toBe(true);
    const parsed = channelContractFileSchema.parse(JSON.parse(text));
    expect(parsed.writes).toHaveLength(4);
    expect(parsed.reads).toHaveLength(5);
  });
});

describe('identifiers', () => {
  it('turns channels and values into constant and type names', () => {
    expect(constantName('op/reef/branch')).toBe('OP_REEF_BRANCH');
    expect(constantName('L4')).toBe('L4');
    expect(constantName('left')).toBe('LEFT');
    expect(constantName('3-piece')).toBe('V_3_PIECE');
    expect(constantName('¿?')).toBe('VALUE');
    expect(typeName('op/reef/branch')).toBe('OpReefBranch');
    expect(typeName('op/intake/eject')).toBe('OpIntakeEject');
  });
});

// Java identifiers: JLS SE 21 §3.8 (a Java letter, then Java letters or digits; we emit ASCII only) and not a
// keyword, boolean literal or null literal (JLS §3.9, §3.10.3, §3.10.7). Python identifiers: the Python
// Language Reference 3.12 §2.3 (ASCII subset: letter or underscore, then letters, digits, underscores), and
// not a keyword or soft keyword (§2.3.1, §2.3.2). Both keyword lists are copied in contract.ts from those specs.
const JAVA_IDENTIFIER = /^[A-Za-z_$][A-Za-z0-9_$]*$/;
const PYTHON_IDENTIFIER = /^[A-Za-z_][A-Za-z0-9_]*$/;

describe('contractJava', () => {
  const java = contractJava(channelContract(matchPanel), { className: 'gullwing panel', panelName: 'Gullwing match panel' });

  it('is one final class of channel constants with nested value classes', () => {
    expect(java).toContain('public final class GullwingPanel {\n  private GullwingPanel() {}');
    expect(java).toContain(
      '  /** string, one of A, B, C, D, E, F, G, H, I, J, K, L; written by "Branch" (reef picker). */\n  public static final String OP_REEF_BRANCH = "op/reef/branch";',
    );
    expect(java).toContain('  public static final String ROBOT_BATTERY_VOLTAGE = "robot/battery/voltage";');
    expect(java).toContain(
      [
        '  /** Allowed values of op/reef/level. */',
        '  public static final class OpReefLevel {',
        '    private OpReefLevel() {}',
        '',
        '    public static final String L4 = "L4";',
        '    public static final String L3 = "L3";',
        '    public static final String L2 = "L2";',
        '    public static final String L1 = "L1";',
        '',
        '    public static final java.util.List<String> VALUES = java.util.List.of(L4, L3, L2, L1);',
        '',
        '    public static boolean isAllowed(String value) {',
        '      return VALUES.contains(value);',
        '    }',
        '  }',
      ].join('\n'),
    );
    // A value starting with a digit is prefixed; one named like the VALUES list is moved aside.
    expect(java).toContain('public static final String V_3_PIECE = "3-piece";');
    expect(java).toContain('public static final String VALUES_2 = "values";');
    // The robot publishes robot/ channels; an op/ channel the panel only echoes is not repeated.
    expect(java.match(/= "op\/reef\/level";/g)).toHaveLength(1);
    expect(java).toContain('// ---- The panel shows these; the robot code publishes them. ----');
  });

  it('uses only valid Java identifiers, none a keyword, none repeated in one class', () => {
    const fields = [...java.matchAll(/public static final (?:String|java\.util\.List<String>) (\S+) =/g)].map((m) => m[1]!);
    const classes = [...java.matchAll(/class (\S+) \{/g)].map((m) => m[1]!);
    expect(fields.length).toBeGreaterThan(20);
    for (const id of [...fields, ...classes]) {
      expect(id).toMatch(JAVA_IDENTIFIER);
      expect(JAVA_RESERVED.has(id)).toBe(false);
    }
    expect(new Set(classes).size).toBe(classes.length);
    // Per class: split at nested class headers and look for repeats.
    for (const body of java.split(/class \S+ \{/)) {
      const names = [...body.matchAll(/public static final (?:String|java\.util\.List<String>) (\S+) =/g)].map((m) => m[1]!);
      expect(new Set(names).size).toBe(names.length);
    }
    // Braces balance.
    expect(java.split('{').length).toBe(java.split('}').length);
  });

  it('keeps odd labels and values from breaking comments or strings', () => {
    const odd = channelContract(doc([tile('choice-pad', 'x', { label: 'End */ \\u000a here', options: [{ label: 'q', value: 'say "hi"\\' }, { label: 'b', value: 'b' }] })]));
    const text = contractJava(odd, { className: 'class' });
    expect(text).toContain('public final class Class {');
    expect(text).not.toContain('End */');
    expect(text).not.toContain('\\u000a');
    expect(text).toContain('= "say \\"hi\\"\\\\";');
  });
});

describe('contractPython', () => {
  const python = contractPython(channelContract(matchPanel), { panelName: 'Gullwing match panel' });

  it('is a module of Final constants and value tuples', () => {
    expect(python.startsWith("\"\"\"Channel contract of the Pitwall panel 'Gullwing match panel' (pitwall.channel-contract v1).")).toBe(true);
    expect(python).toContain('from typing import Final');
    expect(python).toContain(
      [
        'OP_REEF_LEVEL: Final = "op/reef/level"',
        'OP_REEF_LEVEL_L4: Final = "L4"',
        'OP_REEF_LEVEL_L3: Final = "L3"',
        'OP_REEF_LEVEL_L2: Final = "L2"',
        'OP_REEF_LEVEL_L1: Final = "L1"',
        'OP_REEF_LEVEL_VALUES: Final = (OP_REEF_LEVEL_L4, OP_REEF_LEVEL_L3, OP_REEF_LEVEL_L2, OP_REEF_LEVEL_L1)',
      ].join('\n'),
    );
    expect(python).toContain('OP_AUTO_ROUTINE_3_PIECE: Final = "3-piece"');
    // A value named "values" would meet the tuple's name: the value moves aside, the tuple keeps its name.
    expect(python).toContain('OP_AUTO_ROUTINE_VALUES_2: Final = "values"');
    expect(python).toContain('OP_AUTO_ROUTINE_VALUES: Final = (OP_AUTO_ROUTINE_LEAVE, OP_AUTO_ROUTINE_3_PIECE, OP_AUTO_ROUTINE_ALL, OP_AUTO_ROUTINE_VALUES_2)');
    expect(python).toContain('ROBOT_MATCH_REMAINING: Final = "robot/match/remaining"');
  });

  it('uses only valid Python identifiers, none a keyword, none repeated', () => {
    const names = [...python.matchAll(/^(\S+): Final = /gm)].map((m) => m[1]!);
    expect(names.length).toBeGreaterThan(20);
    for (const id of names) {
      expect(id).toMatch(PYTHON_IDENTIFIER);
      expect(PYTHON_RESERVED.has(id)).toBe(false);
    }
    expect(new Set(names).size).toBe(names.length);
  });

  it('writes a one-value tuple with its trailing comma', () => {
    const one = contractPython(channelContract(doc([tile('choice-pad', 'x', { options: [{ label: 'Only', value: 'only' }, { label: 'Only', value: 'only' }] })])));
    expect(one).toContain('OP_AUTO_ROUTINE_VALUES: Final = (OP_AUTO_ROUTINE_ONLY,)');
  });
});
