/**
 * CI's dependency audit: `npm audit --json` over the shipped (non-dev) dependencies. High or
 * critical advisories fail the build. A registry whose audit endpoint cannot be reached or refuses
 * the request (some mirrors answer 405) says nothing about our dependencies, so that case is
 * reported and skipped rather than failing every build; any other npm error still fails.
 *
 * Run: npx tsx scripts/auditCheck.ts
 */
import { spawnSync } from 'node:child_process';

export type AuditDecision = { outcome: 'pass'; message: string } | { outcome: 'skip'; message: string } | { outcome: 'fail'; message: string };

export const SKIP_NOTICE = "npm audit skipped: the registry's audit endpoint could not be reached";

// Error codes that mean the network or the endpoint failed, not the project.
const UNREACHABLE_CODES = new Set([
  'ENOTFOUND',
  'EAI_AGAIN',
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'ESOCKETTIMEDOUT',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'ECONNABORTED',
  'EPIPE',
]);

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function count(value: unknown): number {
  return typeof value === 'number' && Number.isFinite(value) ? value : 0;
}

function endpointUnreachable(report: Record<string, unknown>): boolean {
  const error = report.error;
  if (!isRecord(error)) return false;
  if (typeof report.statusCode === 'number' && typeof report.uri === 'string' && /audit|advisories/i.test(report.uri)) return true;
  const code = typeof error.code === 'string' ? error.code : '';
  if (UNREACHABLE_CODES.has(code)) return true;
  const text = [report.message, error.summary, error.detail].filter((t): t is string => typeof t === 'string').join(' ');
  return /audit endpoint|security\/advisories|network request to .*failed|Method Not Allowed/i.test(text);
}

/** What CI should do with the JSON `npm audit --json` printed. */
export function decide(output: string): AuditDecision {
  let report: unknown;
  try {
    report = JSON.parse(output);
  } catch {
    return { outcome: 'fail', message: 'npm audit printed no JSON report, so the dependencies were not checked.' };
  }
  if (!isRecord(report)) return { outcome: 'fail', message: 'npm audit printed an unexpected report.' };
  const metadata = report.metadata;
  if (isRecord(metadata) && isRecord(metadata.vulnerabilities)) {
    const high = count(metadata.vulnerabilities.high);
    const critical = count(metadata.vulnerabilities.critical);
    if (high + critical > 0) {
      return { outcome: 'fail', message: `npm audit found ${critical} critical and ${high} high severity advisories in the shipped dependencies.` };
    }
    return { outcome: 'pass', message: 'npm audit: no high or critical advisories in the shipped dependencies.' };
  }
  if (endpointUnreachable(report)) {
    const detail =
      typeof report.message === 'string' ? report.message : isRecord(report.error) && typeof report.error.code === 'string' ? report.error.code : '';
    return { outcome: 'skip', message: detail === '' ? SKIP_NOTICE : `${SKIP_NOTICE} (${detail})` };
  }
  const summary = isRecord(report.error) && typeof report.error.summary === 'string' ? report.error.summary : '';
  return { outcome: 'fail', message: `npm audit failed: ${summary || 'no vulnerability counts in its report'}` };
}

function main(): void {
  const run = spawnSync('npm', ['audit', '--omit=dev', '--audit-level=high', '--json'], { encoding: 'utf8', shell: process.platform === 'win32' });
  const decision = decide(run.stdout ?? '');
  if (decision.outcome === 'fail') {
    console.error(decision.message);
    if (run.stderr) console.error(run.stderr.trim());
    process.exit(1);
  }
  console.log(decision.message);
}

if (process.argv[1] !== undefined && /auditCheck\.ts$/.test(process.argv[1])) main();
