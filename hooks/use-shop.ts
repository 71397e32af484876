import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ShopAnswer, ShopSettings } from '@/shared/schemas/shop';
import { api } from './api-client';
import { sessionKeys } from './use-session';

/** Query keys for the shop's settings. */
export const shopKeys = {
  all: ['shop'] as const,
  current: () => [...shopKeys.all, 'current'] as const,
};

/** GET /api/shop: name, altitude (m), preferred pressure unit, comeback window. Every staff role may read it. */
export const shopOptions = () =>
  queryOptions({
    queryKey: shopKeys.current(),
    queryFn: async () => (await api<ShopAnswer>('/shop')).shop,
    staleTime: 5 * 60_000,
  });

export const useShop = () => useQuery(shopOptions());

/** PUT /api/shop (owner). The shop name also shows in the session, so that is refreshed too. */
export function useUpdateShop() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (settings: ShopSettings) => api<ShopAnswer>('/shop', { method: 'PUT', json: settings }),
    onSuccess: (answer) => {
      client.setQueryData(shopKeys.current(), answer.shop);
      void client.invalidateQueries({ queryKey: shopKeys.all });
      void client.invalidateQueries({ queryKey: sessionKeys.me() });
    },
  });
}
