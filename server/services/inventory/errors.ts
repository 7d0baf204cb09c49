// Not-found errors for inventory ids; an id outside a tenant user's view is reported exactly like a missing one.
import { AppError } from '../../errors';

export type InventoryKind = 'site' | 'span' | 'tenant' | 'slice';

const CODES = { site: 'SITE_NOT_FOUND', span: 'SPAN_NOT_FOUND', tenant: 'TENANT_NOT_FOUND', slice: 'SLICE_NOT_FOUND' } as const;

export class InventoryNotFoundError extends AppError {
  readonly code: string;
  readonly status = 404;
  constructor(kind: InventoryKind, id: string) {
    super(`No ${kind} "${id}".`);
    this.code = CODES[kind];
  }
}

/** The stored inventory does not form a valid scenario (should not happen: imports validate before writing). */
export class ExportInvalidError extends AppError {
  readonly code = 'EXPORT_INVALID';
  readonly status = 500;
  constructor(firstProblem: string) {
    super(`The stored inventory does not form a valid scenario: ${firstProblem}`);
  }
}
