// Filter by tenant: the tenants the user may see as choices; hidden when there is only one (a tenant user).
import { useTenantsQuery } from '@/hooks/queries/tenants';
import { Segmented } from '@/components/inventory/segmented';

const ALL = '__all__';

export function TenantFilter({ value, onChange }: { value: string | null; onChange: (tenantId: string | null) => void }) {
  const tenants = useTenantsQuery();
  const items = tenants.data?.items ?? [];
  if (items.length < 2) return null;
  const choices = [{ value: ALL, label: 'All tenants' }, ...items.map((t) => ({ value: t.id, label: t.name }))];
  return (
    <Segmented
      choices={choices}
      value={value ?? ALL}
      onChange={(choice) => onChange(choice === ALL ? null : choice)}
      testID="slices-tenant"
      label="Tenant"
    />
  );
}
