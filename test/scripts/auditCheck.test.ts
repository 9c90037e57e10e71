/**
 * The CI audit's decision: only a registry that cannot answer may skip the audit; advisories of
 * high or critical severity, and every other npm failure, fail the build. The fixtures are
 * shaped like `npm audit --json` output (the 405 one is what this sandbox's registry returns).
 */
import { describe, expect, it } from 'vitest';
import { SKIP_NOTICE, decide } from '../../scripts/auditCheck';

const report = (counts: Partial<Record<'info' | 'low' | 'moderate' | 'high' | 'critical' | 'total', number>>) =>
  JSON.stringify({
    auditReportVersion: 2,
    vulnerabilities: {},
    metadata: {
      vulnerabilities: { info: 0, low: 0, moderate: 0, high: 0, critical: 0, total: 0, ...counts },
      dependencies: { prod: 12, dev: 0, optional: 0, peer: 0, peerOptional: 0, total: 12 },
    },
  });

const refused = JSON.stringify({
  message: '405 Method Not Allowed - POST https://registry.npmjs.org/-/npm/v1/security/advisories/bulk',
  method: 'POST',
  uri: 'https://registry.npmjs.org/-/npm/v1/security/advisories/bulk',
  headers: { allow: ['GET,HEAD'] },
  statusCode: 405,
  body: '',
  error: { summary: '', detail: '' },
});

const offline = JSON.stringify({
  error: {
    code: 'ENOTFOUND',
    summary: 'request to https://registry.npmjs.org/-/npm/v1/security/advisories/bulk failed, reason: getaddrinfo ENOTFOUND registry.npmjs.org',
    detail: '',
  },
});

const noLockfile = JSON.stringify({
  error: { code: 'ENOLOCK', summary: 'This command requires an existing lockfile.', detail: 'Try creating one first with: npm i --package-lock-only' },
});

describe('npm audit decision', () => {
  it('passes a clean report and one with only low or moderate advisories', () => {
    expect(decide(report({})).outcome).toBe('pass');
    expect(decide(report({ low: 3, moderate: 2, total: 5 })).outcome).toBe('pass');
  });

  it('fails on any high or critical advisory', () => {
    const high = decide(report({ high: 1, total: 1 }));
    expect(high.outcome).toBe('fail');
    expect(high.message).toContain('1 high');
    const critical = decide(report({ critical: 2, moderate: 1, total: 3 }));
    expect(critical.outcome).toBe('fail');
    expect(critical.message).toContain('2 critical');
  });

  it('skips, with the notice, when the audit endpoint refuses or cannot be reached', () => {
    for (const output of [refused, offline]) {
      const decision = decide(output);
      expect(decision.outcome).toBe('skip');
      expect(decision.message.startsWith(SKIP_NOTICE)).toBe(true);
    }
    expect(SKIP_NOTICE).toBe("npm audit skipped: the registry's audit endpoint could not be reached");
  });

  it('fails on npm errors that are not about reaching the endpoint, and on output it cannot read', () => {
    expect(decide(noLockfile).outcome).toBe('fail');
    expect(decide('').outcome).toBe('fail');
    expect(decide('npm ERR! something odd').outcome).toBe('fail');
    expect(decide('[]').outcome).toBe('fail');
  });
});
