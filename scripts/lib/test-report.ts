import { existsSync, readFileSync } from 'node:fs';

export interface SuiteResult {
  name: string;
  code: number;
  reportFile: string;
}

interface VitestJsonReport {
  numPassedTests: number;
  numFailedTests: number;
  numTotalTests: number;
  success: boolean;
}

/** Adds up Vitest's JSON reports; a suite that crashed before writing one counts as a problem. */
export function summarise(results: SuiteResult[]): {
  passed: number;
  failed: number;
  problems: string[];
} {
  let passed = 0;
  let failed = 0;
  const problems: string[] = [];
  for (const result of results) {
    if (!result.reportFile || !existsSync(result.reportFile)) {
      problems.push(`the ${result.name} suite did not report (exit code ${result.code})`);
      continue;
    }
    const report = JSON.parse(readFileSync(result.reportFile, 'utf8')) as VitestJsonReport;
    passed += report.numPassedTests;
    failed += report.numFailedTests;
    if (report.numTotalTests === 0) problems.push(`the ${result.name} suite ran no test`);
    if (result.code !== 0 && report.numFailedTests === 0) {
      problems.push(`the ${result.name} suite exited with code ${result.code}`);
    }
  }
  return { passed, failed, problems };
}
