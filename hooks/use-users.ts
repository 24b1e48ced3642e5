import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PublicUser, UserCreate, UserPatch } from '@/shared/schemas/auth';
import { api } from './api-client';
import { STALE } from './stale-times';

export const userKeys = {
  all: ['users'] as const,
  list: () => [...userKeys.all, 'list'] as const,
};

export const usersQuery = () =>
  queryOptions({
    queryKey: userKeys.list(),
    queryFn: ({ signal }) => api.get<{ items: PublicUser[] }>('/users', signal).then((r) => r.items),
    staleTime: STALE.adminLists,
  });

export function useUsers() {
  return useQuery(usersQuery());
}

export function useCreateUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: UserCreate) => api.post<{ user: PublicUser }>('/users', input).then((r) => r.user),
    onSuccess: () => client.invalidateQueries({ queryKey: userKeys.all }),
  });
}

export function useUpdateUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: UserPatch }) => api.patch<{ user: PublicUser }>(`/users/${id}`, patch).then((r) => r.user),
    onSuccess: () => client.invalidateQueries({ queryKey: userKeys.all }),
  });
}

export function useChangeOwnPassword() {
  return useMutation({
    mutationFn: (input: { currentPassword: string; newPassword: string }) =>
      api.post<{ user: PublicUser }>('/auth/password', input).then((r) => r.user),
  });
}
