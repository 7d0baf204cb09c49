// The slot finder's form: the sites and spans the work takes out plus the timing, its checks, and the request.
import type { SlotSearchCreate } from '@/shared/slots';
import { validateTiming, type TimingErrors, type TimingValues } from './timing-form-state';

export type SlotElement = { kind: 'site' | 'span'; id: string; label: string };

export type SlotFormValues = TimingValues & { elements: SlotElement[] };
export type SlotFormErrors = TimingErrors & { elements?: string };

export function validateSlotForm(values: SlotFormValues): { errors: SlotFormErrors; output: SlotSearchCreate | null } {
  const timing = validateTiming(values);
  const errors: SlotFormErrors = { ...timing.errors };
  if (values.elements.length === 0) errors.elements = 'Pick at least one site or span the work takes out.';
  if (errors.elements || !timing.output) return { errors, output: null };
  return {
    errors,
    output: {
      sites: values.elements.filter((e) => e.kind === 'site').map((e) => e.id),
      spans: values.elements.filter((e) => e.kind === 'span').map((e) => e.id),
      ...timing.output,
    },
  };
}
