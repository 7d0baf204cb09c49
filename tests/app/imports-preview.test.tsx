// Component test of an import's preview: errors listed with file and row or path, Apply disabled while there are
// errors, and Apply behind a confirmation when the preview is clean.
import { fireEvent, render, screen, within } from '@testing-library/react-native';
import type { ImportPreview } from '@/shared/imports';
import { ImportPreviewView, type ImportRecordView } from '@/components/imports/import-preview-view';
import { applyBlocker } from '@/components/imports/apply-bar';

const none = { sites: [], spans: [], tenants: [], slices: [], placements: [], network: [] };

function preview(overrides: Partial<ImportPreview>): ImportPreview {
  const base: ImportPreview = {
    adds: { ...none }, changes: { ...none }, removes: { ...none }, errors: [], warnings: [],
    counts: { adds: 0, changes: 0, removes: 0, errors: 0, warnings: 0 },
  };
  const merged = { ...base, ...overrides };
  const count = (lists: Record<string, unknown[]>) => Object.values(lists).reduce((n, l) => n + l.length, 0);
  merged.counts = {
    adds: count(merged.adds), changes: count(merged.changes), removes: count(merged.removes),
    errors: merged.errors.length, warnings: merged.warnings.length,
  };
  return merged;
}

function record(p: ImportPreview, status: ImportRecordView['status'] = 'previewed'): ImportRecordView {
  return { id: 'imp-1', kind: 'csv-sites', fileName: 'sites.csv', status, preview: p };
}

function renderPreview(r: ImportRecordView, onApply = jest.fn()) {
  render(<ImportPreviewView record={r} onApply={onApply} applying={false} applyError={null} applied={null} />);
  return { onApply };
}

const WITH_ERRORS = preview({
  adds: { ...none, sites: ['site-new'] },
  errors: [
    { file: 'sites.csv', row: 3, message: 'column "lat": latitude must be within −90…90' },
    { file: 'scenario.json', path: '$.slices[2].ties[0].to', message: 'unknown function "f9"' },
  ],
  warnings: [{ file: 'sites.csv', row: 4, message: 'placement over capacity' }],
});

test('every error is listed with its file and row or path and its message', () => {
  renderPreview(record(WITH_ERRORS));
  const errors = screen.getByTestId('import-errors');
  expect(errors).toHaveTextContent(/2 errors/);
  expect(within(errors).getByTestId('import-errors-0')).toHaveTextContent(/sites\.csv · row 3/);
  expect(within(errors).getByTestId('import-errors-0')).toHaveTextContent(/latitude must be within/);
  expect(within(errors).getByTestId('import-errors-1')).toHaveTextContent(/scenario\.json · \$\.slices\[2\]\.ties\[0\]\.to/);
  expect(screen.getByTestId('import-warnings-0')).toHaveTextContent(/row 4.*placement over capacity/);
});

test('with errors, Apply is disabled, says why, and pressing it neither confirms nor applies', () => {
  const { onApply } = renderPreview(record(WITH_ERRORS));
  const apply = screen.getByTestId('import-apply');
  expect(apply).toBeDisabled();
  expect(screen.getByTestId('import-apply-blocked')).toHaveTextContent(/errors/);
  fireEvent.press(apply);
  expect(screen.queryByTestId('import-confirm')).toBeNull();
  expect(onApply).not.toHaveBeenCalled();
});

test('a clean preview lists adds, changes and removes per entity, and applies only after confirmation', () => {
  const clean = preview({
    adds: { ...none, sites: ['site-a', 'site-b'] },
    changes: { ...none, spans: [{ id: 'span-1', fields: [{ field: 'capacityGbps', before: 10, after: 40 }] }] },
    removes: { ...none, slices: ['slice-old'] },
  });
  const { onApply } = renderPreview(record(clean));
  expect(screen.getByTestId('import-adds-sites')).toHaveTextContent(/Add 2.*site-a, site-b/);
  expect(screen.getByTestId('import-updates-spans')).toHaveTextContent(/span-1.*capacityGbps: 10 → 40/);
  expect(screen.getByTestId('import-removes-slices')).toHaveTextContent(/Remove 1.*slice-old/);

  fireEvent.press(screen.getByTestId('import-apply'));
  expect(screen.getByTestId('import-confirm')).toHaveTextContent(/2 to add, 1 to change, 1 to remove/);
  expect(onApply).not.toHaveBeenCalled();
  fireEvent.press(screen.getByTestId('import-confirm-cancel'));
  expect(screen.queryByTestId('import-confirm')).toBeNull();

  fireEvent.press(screen.getByTestId('import-apply'));
  fireEvent.press(screen.getByTestId('import-confirm-apply'));
  expect(onApply).toHaveBeenCalledTimes(1);
});

test('applyBlocker: errors, nothing to do, and a used-up import each block; a clean previewed one does not', () => {
  const counts = { adds: 1, changes: 0, removes: 0, errors: 0, warnings: 2 };
  expect(applyBlocker(counts, 'previewed')).toBeNull();
  expect(applyBlocker({ ...counts, errors: 1 }, 'previewed')).toMatch(/errors/);
  expect(applyBlocker({ ...counts, adds: 0 }, 'previewed')).toMatch(/Nothing to apply/);
  expect(applyBlocker(counts, 'applied')).toMatch(/applied/);
  expect(applyBlocker(counts, 'superseded')).toMatch(/no longer/);
});
