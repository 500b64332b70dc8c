import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type PriceUnit = 'sheet' | 'board-foot' | 'metre';

export interface StockPrice {
  /** As plans name it, or `*` for any material. */
  material: string;
  per: PriceUnit;
  amount: number;
}

/** A builder's shop as the server keeps it; all lengths in mm. */
export interface ShopProfileValues {
  kerf: number;
  edgeTrim: number;
  sheets: Array<{ length: number; width: number }>;
  barLengths: number[];
  solidAllowance: { length: number; width: number; thickness: number };
  /** ISO 4217 code. */
  currency: string;
  prices: StockPrice[];
}

export interface ShopProfile extends ShopProfileValues {
  /** False until the member saves one: the values are the cut list's defaults. */
  saved: boolean;
  updatedAt: string | null;
}

export const shopProfilePath = (login: string) => `/members/${encodeURIComponent(login)}/shop-profile`;

export const shopProfileQueryOptions = (login: string) =>
  queryOptions({
    queryKey: ['shop-profile', login],
    queryFn: () => api<ShopProfile>(shopProfilePath(login)),
    staleTime: 5 * 60_000,
  });

/** The signed-in member's shop profile; nothing is fetched for a visitor. */
export function useShopProfile(login: string | undefined) {
  return useQuery({ ...shopProfileQueryOptions(login ?? ''), enabled: login !== undefined });
}

export function useSaveShopProfile(login: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (profile: ShopProfileValues) =>
      api<ShopProfile>(shopProfilePath(login), { method: 'PUT', body: profile }),
    onSuccess: (saved) => queryClient.setQueryData(shopProfileQueryOptions(login).queryKey, saved),
  });
}
