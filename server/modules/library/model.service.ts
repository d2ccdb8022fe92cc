/** Reading the library by model: the list of models and one model's spec sheet. */
import type { ModelDetailDto, ModelSummaryDto, ModelsQuery } from '@/lib/contracts/library';
import { AppError } from '@/server/errors/app-error';
import { toSpecSummary } from '../specs/spec.mapper';
import { toComponent, toModelRef } from './library.mapper';
import { foldKey } from './keys';
import { ComponentRepository, ModelRepository } from './library.repository';

export async function listModels(query: ModelsQuery): Promise<ModelSummaryDto[]> {
  const models = await ModelRepository.listWithMakes(query.make ? foldKey(query.make) : undefined);
  const counts = await ComponentRepository.countsByModel(models.map((m) => m.id));
  // A model with no published spec yet (only drafts, say) is not in the library's list: its name alone would
  // show an editor's work in progress.
  return models.flatMap((m) => {
    const c = counts.get(m.id);
    return c && c.specCount > 0 ? [{ ...toModelRef(m), ...c }] : [];
  });
}

export async function getModel(id: number): Promise<ModelDetailDto> {
  const model = await ModelRepository.findWithMake(id);
  if (!model) throw AppError.notFound('model', id);
  const components = await ComponentRepository.withPublishedSpecs(id);
  return {
    ...toModelRef(model),
    componentCount: components.length,
    specCount: components.reduce((n, c) => n + c.specs.length, 0),
    components: components.map((c) => ({ ...toComponent(c), specs: c.specs.map(toSpecSummary) })),
  };
}
