/** Test plans and runs: TanStack Query hooks and their keys. A step's answer refreshes the run and its job sheet. */
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  exportPlans,
  getPlan,
  getRun,
  importPlans,
  listPlans,
  listRuns,
  startRun,
  stepBack,
  updatePlan,
} from '../api/plans';
import type { PlansQuery, RunDto, UpdatePlanBody } from '../contracts/plans';
import { invalidateJob } from './use-jobs';

export const PLANS_KEY = ['plans'] as const;
export const PLAN_KEY = ['plan'] as const;
export const RUNS_KEY = ['runs'] as const;

export function usePlansQuery(filter: PlansQuery, enabled = true) {
  return useQuery({
    queryKey: [...PLANS_KEY, filter.modelId ?? null, filter.system ?? null, filter.q?.trim() ?? ''],
    queryFn: () => listPlans({ ...filter, q: filter.q?.trim() || undefined }),
    enabled,
    placeholderData: keepPreviousData,
  });
}

export function usePlanQuery(id: number) {
  return useQuery({ queryKey: [...PLAN_KEY, id], queryFn: () => getPlan(id), enabled: Number.isInteger(id) && id > 0 });
}

export function useRunsQuery(jobId: number, enabled = true) {
  return useQuery({ queryKey: [...RUNS_KEY, jobId], queryFn: () => listRuns(jobId), enabled: enabled && jobId > 0 });
}

export function useRunQuery(jobId: number, runId: number, enabled = true) {
  return useQuery({
    queryKey: [...RUNS_KEY, jobId, runId],
    queryFn: () => getRun(jobId, runId),
    enabled: enabled && jobId > 0 && runId > 0,
  });
}

export function useStartRunMutation(jobId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (planId: number) => startRun(jobId, planId),
    onSuccess: (run) => {
      qc.setQueryData([...RUNS_KEY, jobId, run.id], run);
      return qc.invalidateQueries({ queryKey: [...RUNS_KEY, jobId], exact: true });
    },
  });
}

/** Going back one step (online only; answers go through the device's queue, lib/hooks/use-run-answer.ts). */
export function useStepBackMutation(jobId: number, runId: number) {
  const qc = useQueryClient();
  const settle = (run: RunDto) => {
    qc.setQueryData([...RUNS_KEY, jobId, runId], run);
    return Promise.all([
      qc.invalidateQueries({ queryKey: [...RUNS_KEY, jobId], exact: true }),
      invalidateJob(qc, jobId),
    ]);
  };
  return useMutation({ mutationFn: () => stepBack(jobId, runId), onSuccess: settle });
}

export function useUpdatePlanMutation(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdatePlanBody) => updatePlan(id, body),
    onSuccess: (plan) => {
      qc.setQueryData([...PLAN_KEY, id], plan);
      return qc.invalidateQueries({ queryKey: PLANS_KEY });
    },
  });
}

export function usePlanFileMutations() {
  const qc = useQueryClient();
  const imports = useMutation({
    mutationFn: importPlans,
    onSuccess: () => qc.invalidateQueries({ queryKey: PLANS_KEY }),
  });
  const exports = useMutation({ mutationFn: exportPlans });
  return { imports, exports };
}
