/**
 * Turns zod's complaints about a tree document into findings a tree author can
 * act on, each named against the step it is about.
 */
import type { z } from 'zod';
import type { Finding } from './engine-types';

type Issue = z.core.$ZodIssue;

/** Findings for every schema problem, one per field. */
export function schemaFindings(error: z.ZodError): Finding[] {
  const out: Finding[] = [];
  for (const issue of error.issues) collect(issue, [], out);
  // One message per field is enough, even when a union tried several shapes.
  const seen = new Set<string>();
  return out.filter((f) => {
    const key = `${f.stepId}|${f.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

function collect(issue: Issue, prefix: PropertyKey[], out: Finding[]) {
  const path = [...prefix, ...issue.path];
  if (issue.code === 'invalid_union' && issue.errors.length > 0) {
    // Report the shape the author was closest to: the branch whose first
    // complaint is deepest (not "expected an object, got a list").
    const best = [...issue.errors].sort((a, b) => depth(b) - depth(a))[0];
    for (const inner of best) collect(inner, path, out);
    return;
  }
  out.push(toFinding(issue, path));
}

const depth = (issues: Issue[]) => Math.max(0, ...issues.map((i) => i.path.length));

function toFinding(issue: Issue, path: PropertyKey[]): Finding {
  const inStep = path[0] === 'machine' && path[1] === 'states' && path.length >= 3;
  const stepId = inStep ? String(path[2]) : undefined;
  const field = (inStep ? path.slice(3) : path).map(String).join('.');
  let message: string;
  if (issue.code === 'invalid_key' && inStep && path.length === 3) {
    const inner = issue.issues[0]?.message ?? 'That is not a valid step id.';
    message = `The step id "${stepId}" cannot be used. ${inner}`;
  } else if (issue.code === 'invalid_type' && /received undefined/.test(issue.message)) {
    message = `${field || 'The document'} is missing.`;
  } else {
    message = field ? `${field}: ${issue.message}` : issue.message;
  }
  const where = stepId ? `Step "${stepId}", ` : '';
  return { severity: 'error', stepId, code: 'schema', message: where ? `${where}${lowerFirst(message)}` : message };
}

const lowerFirst = (s: string) => (/^[A-Z][a-z]/.test(s) ? s[0].toLowerCase() + s.slice(1) : s);
