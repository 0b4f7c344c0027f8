/** Turn zod's issues into messages a person can act on: `fixtures[3].focus.z: must be a number`. */
import type { z } from 'zod';
import { formatPath } from './schema/document';

/** One readable line per problem, path first. */
export function describeIssues(issues: readonly z.core.$ZodIssue[], limit = 20): string[] {
  const lines = issues.slice(0, limit).map((issue) => `${formatPath(issue.path)}: ${describeIssue(issue)}`);
  if (issues.length > limit) lines.push(`… and ${issues.length - limit} more problems`);
  return lines;
}

function describeIssue(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case 'invalid_type': {
      if (issue.message && !issue.message.startsWith('Invalid input')) return issue.message;
      const received = (issue as { input?: unknown }).input;
      if (received === undefined) return 'is missing';
      return `must be ${article(issue.expected)} (found ${describeValue(received)})`;
    }
    case 'unrecognized_keys':
      return `has ${issue.keys.length === 1 ? 'an unknown field' : 'unknown fields'} ${issue.keys.map((key) => `"${key}"`).join(', ')}`;
    case 'invalid_union': {
      const discriminator = (issue as { discriminator?: string; options?: unknown[] }).discriminator;
      const options = (issue as { options?: unknown[] }).options;
      if (discriminator && options)
        return `must be one of ${options.map((option) => `"${String(option)}"`).join(', ')}`;
      return 'does not match any of the allowed forms';
    }
    case 'invalid_value':
      return issue.message && !issue.message.startsWith('Invalid')
        ? issue.message
        : `must be one of ${issue.values.map((value) => JSON.stringify(value)).join(', ')}`;
    default:
      return issue.message;
  }
}

function article(expected: string): string {
  if (expected === 'array') return 'a list';
  if (expected === 'object') return 'an object';
  return /^[aeiou]/.test(expected) ? `an ${expected}` : `a ${expected}`;
}

function describeValue(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'string')
    return `the text ${JSON.stringify(value.length > 30 ? `${value.slice(0, 30)}…` : value)}`;
  if (typeof value === 'object') return 'an object';
  return `${typeof value} ${String(value)}`;
}
