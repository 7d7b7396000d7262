/** The middle value of the runs (the mean of the two middle ones for an even count). */
export function median(values: readonly number[]): number {
  if (values.length === 0) throw new Error('median of no runs');
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

export type Verdict = 'ok' | 'OVER' | 'info';

/** One line of the bench's table: a figure, how it varied between runs, its budget and whether it is kept. */
export interface FigureRow {
  measure: string;
  value: string;
  spread: string;
  budget: string;
  verdict: Verdict;
}

export interface Budget {
  /** The largest value that keeps the budget. */
  max: number;
  /** Where the number comes from, printed under the table. */
  source: string;
}

const kB = (bytes: number) => `${(bytes / 1000).toFixed(1)} kB`;
// A figure that was never reached (no quiet window, say) is carried as Infinity.
const ms = (v: number) => (Number.isFinite(v) ? `${Math.round(v)} ms` : 'not reached');

export function bytesRow(measure: string, bytes: readonly number[], budget?: Budget): FigureRow {
  const m = median(bytes);
  return {
    measure,
    value: kB(m),
    spread: bytes.length > 1 ? `${kB(Math.min(...bytes))}–${kB(Math.max(...bytes))}` : '',
    budget: budget ? `< ${kB(budget.max)}` : '',
    verdict: budget ? (m < budget.max ? 'ok' : 'OVER') : 'info',
  };
}

export function msRow(measure: string, runs: readonly number[], budget?: Budget): FigureRow {
  const m = median(runs);
  return {
    measure,
    value: ms(m),
    spread: runs.length > 1 ? `${ms(Math.min(...runs))}–${ms(Math.max(...runs))}` : '',
    budget: budget ? `≤ ${ms(budget.max)}` : '',
    verdict: budget ? (m <= budget.max ? 'ok' : 'OVER') : 'info',
  };
}

export function countRow(measure: string, runs: readonly number[], budget?: Budget): FigureRow {
  const m = median(runs);
  return {
    measure,
    value: String(Math.round(m)),
    spread: runs.length > 1 && Math.min(...runs) !== Math.max(...runs) ? `${Math.min(...runs)}–${Math.max(...runs)}` : '',
    budget: budget ? `≤ ${budget.max}` : '',
    verdict: budget ? (m <= budget.max ? 'ok' : 'OVER') : 'info',
  };
}

export function checkRow(measure: string, holds: boolean, value: string, budget: string): FigureRow {
  return { measure, value, spread: '', budget, verdict: holds ? 'ok' : 'OVER' };
}

/** The rows as a Markdown table, ready for the README. */
export function markdownTable(rows: readonly FigureRow[]): string {
  const head = ['measure', 'median', 'range of runs', 'budget', ''];
  const lines = [head, head.map(() => '---'), ...rows.map((r) => [r.measure, r.value, r.spread, r.budget, r.verdict === 'info' ? '' : r.verdict])];
  return lines.map((cells) => `| ${cells.join(' | ')} |`).join('\n');
}

export function brokenBudgets(rows: readonly FigureRow[]): FigureRow[] {
  return rows.filter((r) => r.verdict === 'OVER');
}
