// State of the "Fill what the file lacks" section: open or not, what is typed, and the errors of the last check.
import { useState } from 'react';
import type { ImportDefaultsInput } from '@/shared/imports';
import { checkDefaults, EMPTY_DEFAULTS_FORM, type DefaultsErrors, type DefaultsForm } from './defaults-form';

export function useDefaultsForm() {
  const [open, setOpen] = useState(false);
  const [form, setForm] = useState<DefaultsForm>(EMPTY_DEFAULTS_FORM);
  const [errors, setErrors] = useState<DefaultsErrors>({});
  return {
    open, form, errors,
    toggle: () => setOpen((was) => !was),
    reveal: () => setOpen(true),
    change: (next: DefaultsForm) => {
      setForm(next);
      // A corrected field loses its error at once; the rest wait for the next check.
      if (Object.keys(errors).length > 0) {
        const check = checkDefaults(next);
        setErrors(check.ok ? {} : Object.fromEntries(Object.entries(check.errors).filter(([k]) => k in errors)));
      }
    },
    /**
     * What to send: `undefined` while the section is closed (the file is checked as it is), the defaults when the
     * form is valid, or null when it is not (its errors are then shown and nothing should be sent).
     */
    take: (): ImportDefaultsInput | undefined | null => {
      if (!open) return undefined;
      const check = checkDefaults(form);
      setErrors(check.ok ? {} : check.errors);
      return check.ok ? check.defaults : null;
    },
  };
}
