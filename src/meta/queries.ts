import { useQuery } from '@tanstack/react-query';
import type { Role } from '../../shared/schemas/common';
import { api } from '../api/client';

export interface Meta {
  demo: boolean;
  demoSignIns: { email: string; role: Role; password: string }[];
  devMail: boolean;
}

/** What this server offers (demo sign-ins, the captured-mail inbox); fixed for the server's lifetime. */
export function useMeta() {
  return useQuery({ queryKey: ['meta'], queryFn: () => api.get<Meta>('/meta'), staleTime: Infinity });
}
