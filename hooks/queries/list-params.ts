// Query strings for the inventory list endpoints: leaves out unset filters so the server's defaults apply.
type ParamValue = string | number | boolean | null | undefined;

export function listQueryString(params: Record<string, ParamValue>): string {
  const pairs = Object.entries(params)
    .filter(([, value]) => value !== undefined && value !== null && value !== '')
    .map(([key, value]) => [key, String(value)]);
  const text = new URLSearchParams(pairs).toString();
  return text ? `?${text}` : '';
}
