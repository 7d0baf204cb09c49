// An unsent sign-off decision (comment, code, the decision pressed, whether codes were just set up in place), kept
// per user and window outside the form, so setting up codes, a refetch or leaving and coming back never loses it.
import { createContext, useCallback, useContext, useState, type ReactNode } from 'react';
import type { SignoffDecisionKind } from '@/shared/signoff';

export type DecisionDraft = {
  comment: string;
  code: string;
  /** pressed before codes were set up: the decision the approver is on the way to */
  choice: SignoffDecisionKind | null;
  /** codes were confirmed inside this decision, so the form says what to do next */
  enrolledHere: boolean;
};

const EMPTY: DecisionDraft = { comment: '', code: '', choice: null, enrolledHere: false };

/** Memory only (never storage): a draft lasts as long as the page, and a reload starts clean. */
const drafts = new Map<string, DecisionDraft>();

const DraftKey = createContext<string | null>(null);

/** `draftKey` names the user and the window, so one approver never sees another's unsent comment on a shared phone. */
export function DecisionDraftScope({ draftKey, children }: { draftKey: string; children: ReactNode }) {
  return <DraftKey.Provider value={draftKey}>{children}</DraftKey.Provider>;
}

export const decisionDraftKey = (userId: string, windowId: string) => `${userId}/${windowId}`;

/** Called once the decision is recorded. */
export function forgetDecisionDraft(draftKey: string): void {
  drafts.delete(draftKey);
}

/** The draft and a patcher. Outside a DecisionDraftScope it is plain component state. */
export function useDecisionDraft(): [DecisionDraft, (patch: Partial<DecisionDraft>) => void] {
  const key = useContext(DraftKey);
  const [draft, setDraft] = useState<DecisionDraft>(() => (key ? drafts.get(key) : undefined) ?? EMPTY);
  const update = useCallback((patch: Partial<DecisionDraft>) => {
    setDraft((current) => {
      const next = { ...current, ...patch };
      if (key) drafts.set(key, next);
      return next;
    });
  }, [key]);
  return [draft, update];
}
