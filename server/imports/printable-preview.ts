// Issues quote what the file holds (a cell, a key, a column name). A NUL or lone surrogate there is written as a
// visible \uXXXX escape, so the preview can be stored (jsonb refuses both) and shows where the character was.
import type { ImportIssue } from '../../shared/imports';
import { printableText } from '../../shared/safe-text';
import type { PreviewResult } from './preview';

function printableIssue(issue: ImportIssue): ImportIssue {
  const out: ImportIssue = { ...issue, file: printableText(issue.file), message: printableText(issue.message) };
  if (issue.path !== undefined) out.path = printableText(issue.path);
  return out;
}

export function printablePreview(result: PreviewResult): PreviewResult {
  const { preview } = result;
  return {
    ...result,
    preview: { ...preview, errors: preview.errors.map(printableIssue), warnings: preview.warnings.map(printableIssue) },
  };
}
