import type * as v from 'valibot';
import { fileWords } from '../messages/en/file-words.ts';

/**
 * The parts of a valibot schema this module reads. Schemas are plain objects, so the
 * expected value at any path of a topic file can be worded from the schema itself,
 * rather than from valibot's own terse `expected` strings ("Array", `"rr" | "or"`).
 */
export interface SchemaNode {
  readonly type: string;
  readonly entries?: Readonly<Record<string, SchemaNode>>;
  readonly item?: SchemaNode;
  readonly value?: SchemaNode;
  readonly wrapped?: SchemaNode;
  readonly options?: readonly unknown[];
  readonly literal?: unknown;
  readonly key?: unknown;
  readonly pipe?: readonly { readonly type: string }[];
}

/** One step of an issue path: the key and the object or list it was read from. */
export interface PathStep {
  readonly key: unknown;
  readonly input: unknown;
}

/** A group of at most this many fields is described with its field names. */
const MAX_KEYS_NAMED = 4;

const WRAPPERS = new Set(['optional', 'nullable', 'nullish', 'exact_optional', 'undefinedable']);

function isNode(value: unknown): value is SchemaNode {
  return typeof value === 'object' && value !== null && typeof (value as { type?: unknown }).type === 'string';
}

function unwrap(node: SchemaNode): SchemaNode {
  return WRAPPERS.has(node.type) && node.wrapped !== undefined ? unwrap(node.wrapped) : node;
}

function optionsOf(node: SchemaNode): SchemaNode[] {
  return (node.options ?? []).filter(isNode);
}

/** True when a variant option is the one chosen by the value of the discriminating key. */
function matchesDiscriminator(option: SchemaNode, key: string, input: unknown): boolean {
  if (typeof input !== 'object' || input === null) return false;
  const chosen = (input as Record<string, unknown>)[key];
  const field = option.entries?.[key];
  if (field === undefined) return false;
  const plain = unwrap(field);
  if (plain.type === 'literal') return plain.literal === chosen;
  if (plain.type === 'picklist') return (plain.options ?? []).includes(chosen);
  return false;
}

function childrenAt(node: SchemaNode, step: PathStep): SchemaNode[] {
  const plain = unwrap(node);
  switch (plain.type) {
    case 'object':
    case 'loose_object':
    case 'strict_object': {
      const child = typeof step.key === 'string' ? plain.entries?.[step.key] : undefined;
      return child === undefined ? [] : [child];
    }
    case 'array':
      return plain.item === undefined ? [] : [plain.item];
    case 'record':
      return plain.value === undefined ? [] : [plain.value];
    case 'variant': {
      const options = optionsOf(plain);
      const key = typeof plain.key === 'string' ? plain.key : '';
      const chosen = options.filter((option) => matchesDiscriminator(option, key, step.input));
      return (chosen.length > 0 ? chosen : options).flatMap((option) => childrenAt(option, step));
    }
    case 'union':
      return optionsOf(plain).flatMap((option) => childrenAt(option, step));
    default:
      return [];
  }
}

/** The schemas that can hold the value at `path`, starting from `root` (several under a union). */
export function schemasAt(root: SchemaNode, path: readonly PathStep[]): SchemaNode[] {
  return path.reduce<SchemaNode[]>((nodes, step) => nodes.flatMap((node) => childrenAt(node, step)), [root]);
}

interface Expectation {
  readonly phrases: string[];
  readonly choices: (string | number)[];
  nullable: boolean;
}

function allowsNull(node: SchemaNode): boolean {
  if (node.type === 'nullable' || node.type === 'nullish') return true;
  return WRAPPERS.has(node.type) && node.wrapped !== undefined && allowsNull(node.wrapped);
}

function collect(node: SchemaNode, into: Expectation): void {
  if (allowsNull(node)) into.nullable = true;
  const plain = unwrap(node);
  const add = (phrase: string): void => {
    if (!into.phrases.includes(phrase)) into.phrases.push(phrase);
  };
  switch (plain.type) {
    case 'string':
      return add(fileWords.text);
    case 'number':
      return add(
        (plain.pipe ?? []).some((action) => action.type === 'integer' || action.type === 'safe_integer')
          ? fileWords.wholeNumber
          : fileWords.number,
      );
    case 'boolean':
      return add(fileWords.trueOrFalse);
    case 'array':
      return add(fileWords.list);
    case 'object':
    case 'loose_object':
    case 'strict_object': {
      const keys = Object.keys(plain.entries ?? {});
      return add(keys.length > 0 && keys.length <= MAX_KEYS_NAMED ? fileWords.groupOf(keys) : fileWords.group);
    }
    case 'record':
      return add(fileWords.group);
    case 'null':
      into.nullable = true;
      return;
    case 'picklist':
      for (const option of plain.options ?? []) {
        if ((typeof option === 'string' || typeof option === 'number') && !into.choices.includes(option))
          into.choices.push(option);
      }
      return;
    case 'literal':
      if ((typeof plain.literal === 'string' || typeof plain.literal === 'number') && !into.choices.includes(plain.literal)) {
        into.choices.push(plain.literal);
      }
      return;
    case 'variant': {
      // A variant is read as its discriminating choices when only those are asked for; as a group otherwise.
      return add(fileWords.group);
    }
    case 'union':
      for (const option of optionsOf(plain)) collect(option, into);
      return;
    default:
      return add(fileWords.anyValue);
  }
}

/**
 * The value the schema expects at a path, in plain words: "a whole number", "text",
 * `"benefit" or "harm"`, `one of "rr" (risk ratio), …`, "a number, text or null".
 *
 * @example expectedAt(topicFileSchema, path).text // => 'true or false'
 */
export function expectedAt(root: SchemaNode, path: readonly PathStep[]): string | null {
  const nodes = schemasAt(root, path);
  if (nodes.length === 0) return null;
  const found: Expectation = { phrases: [], choices: [], nullable: false };
  for (const node of nodes) collect(node, found);
  const phrases = [...(found.choices.length > 0 ? [fileWords.choices(found.choices)] : []), ...found.phrases];
  if (found.nullable) phrases.push(fileWords.null);
  return phrases.length === 0 ? null : fileWords.alternatives(phrases);
}

/** What a file holds where a value was wrong, in plain words: "the text "10"", "a list", "nothing". */
export function describeReceived(value: unknown): string {
  if (value === undefined) return fileWords.nothing;
  if (value === null) return fileWords.null;
  if (Array.isArray(value)) return fileWords.list;
  if (typeof value === 'object') return fileWords.group;
  if (typeof value === 'string') return fileWords.receivedText(value.length > 30 ? `${value.slice(0, 30)}…` : value);
  if (typeof value === 'number') return fileWords.receivedNumber(value);
  if (typeof value === 'boolean') return fileWords.receivedBoolean(value);
  return fileWords.receivedOther(typeof value);
}

/** Where the first schema issue of a file lies, and what is expected and found there. */
export interface LocatedIssue {
  readonly issue: v.BaseIssue<unknown> | undefined;
  /** The dotted path of the wrong field; empty for the whole file. */
  readonly path: string;
  /** What the schema expects there in plain words, or null when valibot gave nothing. */
  readonly expected: string | null;
  /** What the file holds there instead, in words. */
  readonly received: string;
}

/**
 * Locate the first issue valibot found. A list found where a group of fields belongs is
 * reported at the list itself, not as the first field missing from it.
 */
export function locateIssue(root: SchemaNode, issues: readonly v.BaseIssue<unknown>[]): LocatedIssue {
  const issue = issues[0];
  let steps: PathStep[] = (issue?.path ?? []).map((item) => ({ key: item.key, input: item.input }));
  let received: unknown = issue?.input;
  const last = steps[steps.length - 1];
  if (last !== undefined && Array.isArray(last.input) && typeof last.key === 'string') {
    received = last.input;
    steps = steps.slice(0, -1);
  }
  const path = steps.map((step) => String(step.key)).join('.');
  const fromValibot = issue?.expected === undefined || issue.expected === null ? null : issue.expected.replace(/^"|"$/g, '');
  return { issue, path, expected: expectedAt(root, steps) ?? fromValibot, received: describeReceived(received) };
}
