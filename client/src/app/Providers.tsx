import { QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { UnitsProvider } from '../shared/lib/units';
import { queryClient } from './queryClient';

export function Providers({ children }: { children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <UnitsProvider>{children}</UnitsProvider>
    </QueryClientProvider>
  );
}
