// Signed-out pages; someone already signed in goes straight to the overview.
import { Redirect, Slot } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';

export default function AuthLayout() {
  const me = useMeQuery();
  if (me.data) return <Redirect href="/" />;
  return <Slot />;
}
