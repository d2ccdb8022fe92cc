/**
 * The rows of a previewed file, kept in import_batch_rows with their planned action, so
 * that the preview can be shown again and the commit applies exactly what it showed
 * without parsing the file twice. Written with multi-row INSERTs (no entity: the commit
 * works on this table set-based, see import-apply.ts); its columns are import-rows.ts's.
 */
import type { EntityManager } from 'typeorm';
import type { RowProblem, SpecCsvRow } from '@/lib/csv';
import { hasFlag } from '@/lib/contracts/spec-fields';
import { unitKind } from '@/lib/units';
import { foldKey, makeKey, modelKey, sourceKey } from '../library/keys';
import type { PlannedRow } from './import-plan';
import { FIRST, INSERT_STAGED, STAGED_COLUMNS, STAGED_FIELDS } from './import-rows';

/** Rows per INSERT: about 1 KB each, far below max_allowed_packet (16 MB). */
const CHUNK = 1000;

type Cell = string | number | null;
const json = (value: unknown[]): string | null => (value.length ? JSON.stringify(value) : null);

const problemsOf = (problems: RowProblem[]) => problems.map((p) => ({ column: p.column, reason: p.reason }));

/**
 * Numbers the batch's distinct models, components and sources (1, 2, …) and marks the
 * first row that needs each to exist, so the commit creates each once and then joins on
 * these small numbers rather than on long text keys.
 */
class Numbering {
  private readonly ords = new Map<string, number>();
  private readonly needed = new Set<string>();
  private created = 0;

  /** 1, 2, … for created rows in file order: the offsets of their spec ids. */
  nextCreated(): number {
    return ++this.created;
  }

  ord(key: string): number {
    let n = this.ords.get(key);
    if (n === undefined) this.ords.set(key, (n = this.ords.size + 1));
    return n;
  }

  /** True the first time `key` is needed. */
  first(key: string): boolean {
    if (this.needed.has(key)) return false;
    this.needed.add(key);
    return true;
  }
}

function keyCells(p: PlannedRow, n: Numbering): Cell[] {
  const r = p.row;
  const keys = {
    make: makeKey(r.make),
    model: modelKey(r),
    component: foldKey(r.component),
    parameter: foldKey(r.parameter),
    source: sourceKey({ title: r.sourceTitle, edition: r.sourceEdition }),
  };
  const componentKey = `${keys.model}|${keys.component}`;
  const creates = p.action === 'create';
  const bit = (needed: boolean, key: string, value: number) => (needed && n.first(key) ? value : 0);
  const firsts =
    bit(creates, `m:${keys.make}`, FIRST.make) |
    bit(creates, `v:${keys.model}`, FIRST.model) |
    bit(creates, `c:${componentKey}`, FIRST.component) |
    bit(p.action !== 'unchanged', `s:${keys.source}`, FIRST.source);
  return [
    keys.make,
    keys.model,
    keys.component,
    keys.parameter,
    keys.source,
    n.ord(`v:${keys.model}`),
    n.ord(`c:${componentKey}`),
    n.ord(`s:${keys.source}`),
    firsts,
    creates ? n.nextCreated() : null,
  ];
}

/** A field's staged cell: trimmed text, empty optional spec text as null (as the spec stores it). */
function valueCell(f: (typeof STAGED_FIELDS)[number], row: SpecCsvRow): Cell {
  const v = row[f.key];
  if (v === undefined) return null;
  if (typeof v !== 'string') return v;
  const nullable = f.column !== null && !hasFlag(f, 'required');
  return nullable ? v || null : v.trim();
}

function plannedCells(batchId: number, p: PlannedRow, warnings: RowProblem[], n: Numbering): Cell[] {
  const r = p.row;
  return [
    batchId,
    p.line,
    p.action,
    p.specId,
    p.baseVersion,
    r.make.trim(),
    r.model.trim(),
    r.yearFrom,
    r.yearTo,
    r.variant.trim(),
    r.component.trim(),
    ...keyCells(p, n),
    unitKind(r.unit),
    ...STAGED_FIELDS.map((f) => valueCell(f, r)),
    json(p.changes),
    json(problemsOf(warnings)),
  ];
}

function rejectedCells(batchId: number, line: number, problems: RowProblem[]): Cell[] {
  const cells: Cell[] = STAGED_COLUMNS.map(() => null);
  cells[0] = batchId;
  cells[1] = line;
  cells[2] = 'rejected';
  cells[STAGED_COLUMNS.indexOf('firsts')] = 0;
  cells[STAGED_COLUMNS.length - 1] = json(problemsOf(problems));
  return cells;
}

async function insertChunked(m: EntityManager, rows: Cell[][]) {
  for (let i = 0; i < rows.length; i += CHUNK) await m.query(INSERT_STAGED, [rows.slice(i, i + CHUNK)]);
}

/** Groups problems by line: one rejected row may have several. */
export function byLine(problems: RowProblem[]): Map<number, RowProblem[]> {
  const lines = new Map<number, RowProblem[]>();
  for (const p of problems) lines.set(p.line, [...(lines.get(p.line) ?? []), p]);
  return lines;
}

/**
 * Stages a batch's rows chunk by chunk, in file order, inside the caller's transaction:
 * the numbering of models, components and sources runs across every chunk.
 */
export class Stager {
  private readonly numbering = new Numbering();

  constructor(
    private readonly m: EntityManager,
    private readonly batchId: number,
  ) {}

  /**
   * Numbers the rows at once (in the order of the calls) and then writes them: a caller may
   * go on with its next chunk while the INSERTs run, and await this before its next call.
   */
  planned(plan: PlannedRow[], warnings: Map<number, RowProblem[]>): Promise<void> {
    const rows = plan.map((p) => plannedCells(this.batchId, p, warnings.get(p.line) ?? [], this.numbering));
    return insertChunked(this.m, rows);
  }

  async rejected(rejected: Map<number, RowProblem[]>) {
    const rows: Cell[][] = [];
    for (const [line, problems] of rejected) rows.push(rejectedCells(this.batchId, line, problems));
    await insertChunked(this.m, rows);
  }
}

export async function stageRows(
  m: EntityManager,
  batchId: number,
  plan: PlannedRow[],
  warnings: Map<number, RowProblem[]>,
  rejected: Map<number, RowProblem[]>,
) {
  const stager = new Stager(m, batchId);
  await stager.planned(plan, warnings);
  await stager.rejected(rejected);
}
