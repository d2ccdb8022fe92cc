import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  acceptCorrection,
  correctionSummary,
  editCorrection,
  getCorrection,
  listCorrections,
  proposeCorrection,
  rejectCorrection,
  withdrawCorrection,
  type CorrectionFilter,
} from '../api/corrections';
import type { EditProposalBody } from '../contracts/corrections';
import { useSession } from '../session/session-provider';
import { SPEC_KEY } from './use-library';
import { PLAN_KEY, PLANS_KEY } from './use-plans';

export const CORRECTIONS_KEY = ['corrections'] as const;

export function useCorrectionsQuery(filter: CorrectionFilter) {
  const { status } = useSession();
  return useQuery({
    queryKey: [...CORRECTIONS_KEY, 'list', filter],
    queryFn: () => listCorrections(filter),
    enabled: status === 'signed-in',
  });
}

/** Pending count for the editors' badge; refreshed every minute. */
export function useCorrectionSummaryQuery() {
  const { status } = useSession();
  return useQuery({
    queryKey: [...CORRECTIONS_KEY, 'summary'],
    queryFn: correctionSummary,
    enabled: status === 'signed-in',
    refetchInterval: 60_000,
  });
}

export function useCorrectionQuery(id: number) {
  const { status } = useSession();
  return useQuery({
    queryKey: [...CORRECTIONS_KEY, 'one', id],
    queryFn: () => getCorrection(id),
    // A page opened directly waits for the session to be restored (a 401 otherwise).
    enabled: status !== 'restoring' && Number.isInteger(id) && id > 0,
  });
}

/** A decision may change a spec or a test plan: both caches are refreshed with the proposals. */
function useInvalidate() {
  const qc = useQueryClient();
  return () =>
    Promise.all([CORRECTIONS_KEY, SPEC_KEY, PLAN_KEY, PLANS_KEY].map((queryKey) => qc.invalidateQueries({ queryKey })));
}

export function useProposeMutation() {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: proposeCorrection, onSuccess: invalidate });
}

export function useEditProposalMutation(id: number) {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: (body: EditProposalBody) => editCorrection(id, body), onSuccess: invalidate });
}

export function useWithdrawMutation() {
  const invalidate = useInvalidate();
  return useMutation({ mutationFn: withdrawCorrection, onSuccess: invalidate });
}

export function useDecideMutation(id: number) {
  const invalidate = useInvalidate();
  return useMutation({
    mutationFn: (d: { accept: true; confirmStale?: boolean; note?: string } | { accept: false; note: string }) =>
      d.accept
        ? acceptCorrection(id, { confirmStale: d.confirmStale, note: d.note || undefined })
        : rejectCorrection(id, d.note),
    onSuccess: invalidate,
  });
}
