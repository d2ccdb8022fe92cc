/** Browser-test helpers for the editors' curation screens: demo specs read from the database, a signed-in editor, waits on text. */
import type { Browser, Locator, Page } from 'playwright-core';
import { AppDataSource } from '@/server/db/data-source';
import type { Cells } from '../fixtures/csv/rows';
import { DESKTOP } from './browser';
import { e2eAccount, signInThroughApi } from './e2e-accounts';

export type SpecRow = { id: number; min: number; nominal: number | null; max: number; version: number };

/** A demo spec with both limits, its id and values; `skip` picks different specs for different tests. */
export async function demoSpec(skip: number): Promise<SpecRow> {
  const [s] = await AppDataSource.query(
    `SELECT id, min_value AS min, nominal_value AS nominal, max_value AS max, version FROM specs
      WHERE quantity_kind = 'resistance' AND min_value IS NOT NULL AND max_value IS NOT NULL ORDER BY id LIMIT 1 OFFSET ?`,
    [skip],
  );
  return s;
}

/** The spec as a CSV row of the import format, read from the database. */
export async function csvRowOf(specId: number): Promise<Cells> {
  const [r] = await AppDataSource.query(
    `SELECT mk.name AS make, vm.name AS model, vm.year_from, vm.year_to, vm.variant, c.name AS component, s.parameter,
       s.min_value AS min, s.nominal_value AS nominal, s.max_value AS max, s.unit, s.ref_temp_c, s.material, s.test_points,
       s.conditions, src.title AS source_title, src.edition AS source_edition, s.source_page, src.url AS source_url, s.notes
     FROM specs s JOIN components c ON c.id = s.component_id JOIN vehicle_models vm ON vm.id = c.model_id
     JOIN makes mk ON mk.id = vm.make_id LEFT JOIN sources src ON src.id = s.source_id WHERE s.id = ?`,
    [specId],
  );
  return Object.fromEntries(Object.entries(r).map(([k, v]) => [k, v === null ? '' : String(v)])) as Cells;
}

/** A new browser context signed in as the editor `name` (created on first use), on the home screen. */
export async function signedInEditor(
  browser: Browser,
  baseUrl: string,
  name: string,
  viewport = DESKTOP,
): Promise<Page> {
  const editor = await e2eAccount('editor', name);
  const page = await (await browser.newContext({ viewport })).newPage();
  await signInThroughApi(page, baseUrl, editor.email);
  return page;
}

/** Waits until the element's text matches (data may refresh after the first paint). */
export const until = (loc: Locator, re: RegExp | string) => loc.filter({ hasText: re }).waitFor();
