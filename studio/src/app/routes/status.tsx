import { HealthPanel } from '@/features/status/components/health-panel';

export function StatusRoute() {
  return <HealthPanel />;
}
