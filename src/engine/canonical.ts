import canonicalize from 'canonicalize';
import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex, utf8ToBytes } from '@noble/hashes/utils.js';
import type { Scenario } from '../contracts/scenario';

/**
 * The canonical JSON text of a validated scenario: RFC 8785 (JSON Canonicalization Scheme) over the
 * parsed form, so defaults are filled in, money is canonical decimal text and keys are sorted.
 * Two files that mean the same scenario give the same text.
 */
export function canonicalScenarioJson(s: Scenario): string {
  const text = canonicalize(s);
  if (text === undefined) throw new Error('scenario cannot be canonicalized');
  return text;
}

/** SHA-256 of a text's UTF-8 bytes, lower-case hex. */
export function sha256Hex(text: string): string {
  return bytesToHex(sha256(utf8ToBytes(text)));
}

/** SHA-256 (hex) of the canonical scenario JSON: the result's inputHash. */
export function scenarioHash(s: Scenario): string {
  return sha256Hex(canonicalScenarioJson(s));
}
