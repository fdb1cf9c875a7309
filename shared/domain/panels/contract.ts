// Pure: imports only zod and shared files. A panel's channel contract: the channels it writes (the robot code
// reads them) and reads (the robot publishes them), with value types and allowed values, as versioned JSON
// and as ready-to-paste constants for robot code in Java and in Python.
import { z } from 'zod';
import type { PanelDocument, Tile } from '../../schemas/panel';
import { OP_CHANNELS } from '../channels';
import { TILE_CATALOGUE, tileReads, tileWrites, type ChannelUse, type ChannelValueType } from './tile-catalogue';

export type ContractTile = { id: string; label: string; kind: Tile['kind'] };
/** `otherTypes`: types other tiles write on the same channel (a clash the panel check reports as an error). */
export type ContractChannel = { channel: string; type: ChannelValueType; values?: string[]; otherTypes?: ChannelValueType[]; tiles: ContractTile[] };
export type ChannelContract = { writes: ContractChannel[]; reads: ContractChannel[] };

export const CHANNEL_CONTRACT_FORMAT = 'pitwall.channel-contract';
export const CHANNEL_CONTRACT_VERSION = 1;

const contractChannelSchema = z.object({
  channel: z.string(),
  type: z.enum(['string', 'boolean', 'number', 'json']),
  values: z.array(z.string()).optional(),
  otherTypes: z.array(z.enum(['string', 'boolean', 'number', 'json'])).optional(),
  tiles: z.array(z.object({ id: z.string(), label: z.string(), kind: z.string() })),
});
/** The JSON file `contractJson` writes. */
export const channelContractFileSchema = z.object({
  format: z.literal(CHANNEL_CONTRACT_FORMAT),
  version: z.literal(CHANNEL_CONTRACT_VERSION),
  panel: z.string(),
  writes: z.array(contractChannelSchema),
  reads: z.array(contractChannelSchema),
});
export type ChannelContractFile = z.infer<typeof channelContractFileSchema>;

function collect(doc: PanelDocument, usesOf: (tile: Tile) => ChannelUse[]): Map<string, ContractChannel> {
  const byChannel = new Map<string, ContractChannel>();
  for (const page of doc.pages) {
    for (const tile of page.tiles) {
      for (const use of usesOf(tile)) {
        if (typeof use.channel !== 'string' || use.channel.trim() === '') continue;
        const entry = byChannel.get(use.channel) ?? { channel: use.channel, type: use.type, tiles: [] };
        // The first writer's type stands (the panel check reports a clash); values are the union, first seen first.
        if (use.values) entry.values = [...new Set([...(entry.values ?? []), ...use.values])];
        if (use.type !== entry.type && !entry.otherTypes?.includes(use.type)) entry.otherTypes = [...(entry.otherTypes ?? []), use.type];
        if (!entry.tiles.some((t) => t.id === tile.id)) entry.tiles.push({ id: tile.id, label: tile.label, kind: tile.kind });
        byChannel.set(use.channel, entry);
      }
    }
  }
  return byChannel;
}

const byName = (a: ContractChannel, b: ContractChannel) => (a.channel < b.channel ? -1 : a.channel > b.channel ? 1 : 0);

/**
 * What the panel writes and reads, each sorted by channel. A read typed 'json' (a target echo, a readout of
 * text) takes the type and values of the tile that writes the channel, or of the standard op/ channel.
 */
export function channelContract(doc: PanelDocument): ChannelContract {
  const writes = collect(doc, tileWrites);
  const reads = collect(doc, tileReads);
  for (const read of reads.values()) {
    if (read.type !== 'json') continue;
    const written = writes.get(read.channel);
    const standard = OP_CHANNELS[read.channel as keyof typeof OP_CHANNELS];
    if (written) {
      read.type = written.type;
      if (written.values) read.values = [...written.values];
    } else if (standard) {
      read.type = 'string';
      read.values = [...standard.options];
    }
  }
  return { writes: [...writes.values()].sort(byName), reads: [...reads.values()].sort(byName) };
}

/** The contract as a pretty JSON file: `{ format: 'pitwall.channel-contract', version: 1, panel, writes, reads }`. */
export function contractJson(contract: ChannelContract, panelName: string): string {
  const file: ChannelContractFile = {
    format: CHANNEL_CONTRACT_FORMAT,
    version: CHANNEL_CONTRACT_VERSION,
    panel: panelName,
    writes: contract.writes,
    reads: contract.reads,
  };
  return `${JSON.stringify(file, null, 2)}\n`;
}

// ---- identifiers --------------------------------------------------------------------------------

/** Words of a channel or value: runs of ASCII letters and digits ("op/reef-branch" → op, reef, branch). */
function words(text: string): string[] {
  return text.split(/[^A-Za-z0-9]+/).filter(Boolean);
}

/** UPPER_SNAKE from any text, prefixed when it would start with a digit, `fallback` when nothing is left. */
export function constantName(text: string, fallback = 'VALUE', digitPrefix = 'V_'): string {
  const name = words(text).join('_').toUpperCase();
  if (name === '') return fallback;
  return /^[0-9]/.test(name) ? `${digitPrefix}${name}` : name;
}

/** PascalCase from any text ("op/reef/branch" → OpReefBranch), prefixed when it would start with a digit. */
export function typeName(text: string, fallback = 'Values'): string {
  const name = words(text)
    .map((w) => w.charAt(0).toUpperCase() + w.slice(1))
    .join('');
  if (name === '') return fallback;
  return /^[0-9]/.test(name) ? `V${name}` : name;
}

/** A name not yet in `used` and not reserved (adding _2, _3 … or 2, 3 …), which it then records. */
function unique(name: string, used: Set<string>, separator = '_'): string {
  const base = JAVA_RESERVED.has(name) || PYTHON_RESERVED.has(name) ? `${name}_` : name;
  let candidate = base;
  for (let n = 2; used.has(candidate); n += 1) candidate = `${base}${separator}${n}`;
  used.add(candidate);
  return candidate;
}

/** A one-line comment text: no line breaks, no comment terminators, no backslashes (Java reads \u escapes even in comments). */
function commentText(text: string): string {
  return text.replace(/[\r\n\u2028\u2029]+/g, ' ').replace(/\*\//g, '* /').replace(/\\/g, '/');
}

/** A double-quoted string literal valid in both Java and Python (JSON's escapes are a subset of both). */
function literal(text: string): string {
  return JSON.stringify(text);
}

function tilesText(tiles: readonly ContractTile[]): string {
  return tiles
    .map((t) => {
      const kind = TILE_CATALOGUE[t.kind]?.label.toLowerCase() ?? t.kind;
      return t.label.trim() ? `"${t.label}" (${kind})` : `a ${kind}`;
    })
    .join(', ');
}

function typeText(c: ContractChannel): string {
  const type = c.values ? `${c.type}, one of ${c.values.join(', ')}` : c.type === 'json' ? 'any value' : c.type;
  return c.otherTypes ? `${type} (CLASH: also written as ${c.otherTypes.join(', ')}; fix the panel)` : type;
}

type Named = { channel: ContractChannel; constant: string; valueGroup?: string; values: { value: string; constant: string }[] };

/** The robot code's view: channels it reads (the panel writes) and robot/ channels it publishes that the panel shows. */
function codeChannels(contract: ChannelContract): { reads: ContractChannel[]; publishes: ContractChannel[] } {
  const written = new Set(contract.writes.map((c) => c.channel));
  return { reads: contract.writes, publishes: contract.reads.filter((c) => !written.has(c.channel)) };
}

// ---- Java ---------------------------------------------------------------------------------------

/** Java keywords and literals (JLS SE 21 §3.9 reserved and contextual keywords, §3.10.3–3.10.8 literals). */
export const JAVA_RESERVED = new Set([
  'abstract', 'assert', 'boolean', 'break', 'byte', 'case', 'catch', 'char', 'class', 'const', 'continue', 'default', 'do',
  'double', 'else', 'enum', 'extends', 'final', 'finally', 'float', 'for', 'goto', 'if', 'implements', 'import', 'instanceof',
  'int', 'interface', 'long', 'native', 'new', 'package', 'private', 'protected', 'public', 'return', 'short', 'static',
  'strictfp', 'super', 'switch', 'synchronized', 'this', 'throw', 'throws', 'transient', 'try', 'void', 'volatile', 'while',
  '_', 'exports', 'module', 'non-sealed', 'open', 'opens', 'permits', 'provides', 'record', 'requires', 'sealed', 'to',
  'transitive', 'uses', 'var', 'when', 'with', 'yield', 'true', 'false', 'null',
]);

export type JavaOptions = { className?: string; packageName?: string; panelName?: string };

/**
 * A final Java class of `public static final String` channel names, with one nested final class per
 * channel that has allowed values (a constant per value, `VALUES` as an immutable list and `isAllowed`).
 */
export function contractJava(contract: ChannelContract, options: JavaOptions = {}): string {
  const className = typeName(options.className ?? 'PanelChannels', 'PanelChannels');
  const fieldNames = new Set<string>();
  const classNames = new Set<string>([className]);
  const name = (c: ContractChannel): Named => {
    const constant = unique(constantName(c.channel, 'CHANNEL', 'CHANNEL_'), fieldNames);
    if (!c.values) return { channel: c, constant, values: [] };
    const group = unique(typeName(c.channel), classNames, '');
    const used = new Set(['VALUES']);
    return { channel: c, constant, valueGroup: group, values: c.values.map((value) => ({ value, constant: unique(constantName(value), used) })) };
  };
  const { reads, publishes } = codeChannels(contract);
  const readNames = reads.map(name);
  const publishNames = publishes.map(name);
  const lines: string[] = [];
  if (options.packageName) lines.push(`package ${options.packageName};`, '');
  lines.push(
    `// Channel contract${options.panelName ? ` of the Pitwall panel "${commentText(options.panelName)}"` : ' of a Pitwall panel'} (${CHANNEL_CONTRACT_FORMAT} v${CHANNEL_CONTRACT_VERSION}).`,
    '// Made by Pitwall: paste it into the robot project and keep it in step with the panel.',
    '',
    `/** Channel names and allowed values shared by the operator panel and the robot code. */`,
    `public final class ${className} {`,
    `  private ${className}() {}`,
  );
  const field = (n: Named, why: string) => {
    lines.push('', `  /** ${commentText(`${typeText(n.channel)}; ${why} ${tilesText(n.channel.tiles)}.`)} */`);
    lines.push(`  public static final String ${n.constant} = ${literal(n.channel.channel)};`);
  };
  if (readNames.length > 0) lines.push('', '  // ---- The panel writes these; the robot code reads them. ----');
  for (const n of readNames) field(n, 'written by');
  if (publishNames.length > 0) lines.push('', '  // ---- The panel shows these; the robot code publishes them. ----');
  for (const n of publishNames) field(n, 'shown by');
  for (const n of [...readNames, ...publishNames]) {
    if (!n.valueGroup) continue;
    lines.push('', `  /** ${commentText(`Allowed values of ${n.channel.channel}.`)} */`, `  public static final class ${n.valueGroup} {`, `    private ${n.valueGroup}() {}`, '');
    for (const v of n.values) lines.push(`    public static final String ${v.constant} = ${literal(v.value)};`);
    lines.push('', `    public static final java.util.List<String> VALUES = java.util.List.of(${n.values.map((v) => v.constant).join(', ')});`);
    lines.push('', '    public static boolean isAllowed(String value) {', '      return VALUES.contains(value);', '    }', '  }');
  }
  lines.push('}', '');
  return lines.join('\n');
}

// ---- Python -------------------------------------------------------------------------------------

/** Python keywords and soft keywords (The Python Language Reference 3.12, §2.3.1 Keywords and §2.3.2 Soft Keywords). */
export const PYTHON_RESERVED = new Set([
  'False', 'None', 'True', 'and', 'as', 'assert', 'async', 'await', 'break', 'class', 'continue', 'def', 'del', 'elif',
  'else', 'except', 'finally', 'for', 'from', 'global', 'if', 'import', 'in', 'is', 'lambda', 'nonlocal', 'not', 'or',
  'pass', 'raise', 'return', 'try', 'while', 'with', 'yield', 'match', 'case', 'type', '_',
]);

/**
 * A Python module of constants: each channel name, each allowed value as `<CHANNEL>_<VALUE>`, and the
 * allowed values as a tuple `<CHANNEL>_VALUES`. Names are `typing.Final`.
 */
export function contractPython(contract: ChannelContract, options: { panelName?: string } = {}): string {
  const used = new Set<string>(['Final']);
  const { reads, publishes } = codeChannels(contract);
  const lines: string[] = [
    `"""Channel contract${options.panelName ? ` of the Pitwall panel '${commentText(options.panelName).replace(/"/g, "'")}'` : ' of a Pitwall panel'} (${CHANNEL_CONTRACT_FORMAT} v${CHANNEL_CONTRACT_VERSION}).`,
    '',
    'Made by Pitwall: paste it into the robot project and keep it in step with the panel.',
    '"""',
    '',
    'from typing import Final',
  ];
  const section = (title: string, channels: ContractChannel[], why: string) => {
    if (channels.length === 0) return;
    lines.push('', `# ---- ${title} ----`);
    for (const c of channels) {
      const constant = unique(constantName(c.channel, 'CHANNEL', 'CHANNEL_'), used);
      lines.push('', `# ${commentText(`${typeText(c)}; ${why} ${tilesText(c.tiles)}.`)}`, `${constant}: Final = ${literal(c.channel)}`);
      if (!c.values) continue;
      // The tuple's name is taken first, so it is always <CHANNEL>_VALUES and a value named "values" moves aside.
      const tupleName = unique(`${constant}_VALUES`, used);
      const names = c.values.map((value) => {
        const n = unique(`${constant}_${constantName(value, 'VALUE', '')}`, used);
        lines.push(`${n}: Final = ${literal(value)}`);
        return n;
      });
      lines.push(`${tupleName}: Final = (${names.join(', ')}${names.length === 1 ? ',' : ''})`);
    }
  };
  section('The panel writes these; the robot code reads them.', reads, 'written by');
  section('The panel shows these; the robot code publishes them.', publishes, 'shown by');
  lines.push('');
  return lines.join('\n');
}
