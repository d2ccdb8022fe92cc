/**
 * Where each pin of a connector face sits: pin 1 at the top left (numbering left-to-right)
 * or the top right (right-to-left), counting along each row, then the next row down.
 */
import type { ConnectorDto } from '../contracts/plans';

export type PinCell = { number: number; row: number; column: number };

export function connectorCells(c: Pick<ConnectorDto, 'rows' | 'columns' | 'numbering'>): PinCell[] {
  const cells: PinCell[] = [];
  for (let row = 0; row < c.rows; row++)
    for (let i = 0; i < c.columns; i++) {
      const column = c.numbering === 'left-to-right' ? i : c.columns - 1 - i;
      cells.push({ number: row * c.columns + i + 1, row, column });
    }
  return cells;
}
