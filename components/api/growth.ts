import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  growthOrderDetailSchema,
  growthOrderSchema,
  growthOrdersResponseSchema,
  type GrowthOrderDetail,
  type ReleaseRequest,
} from '@/shared/api/growth';
import { ApiError, apiBaseUrl, apiGet, apiSend } from './client';
import { measurementReportSchema } from '@/shared/api/growth-documents';
import type { PickedFile } from './picked-file';
import { appendFile } from './upload-form';

/** Every growth query starts with this key: one invalidation refreshes lists and orders. */
export const growthQueryKey = ['growth'] as const;
export const growthListKey = [...growthQueryKey, 'list'] as const;
export const growthOrderKey = (id: string) => [...growthQueryKey, 'order', id] as const;

/** How often an order is asked again while its sheet is being computed (ms), if no event says so first. */
export const computingPollMs = 3_000;

const orderPath = (id: string) => `/api/growth-orders/${encodeURIComponent(id)}`;

/** `GET /api/growth-orders`: the team's orders, newest first. */
export function useGrowthOrders() {
  return useQuery({
    queryKey: growthListKey,
    queryFn: ({ signal }) => apiGet('/api/growth-orders', growthOrdersResponseSchema, { signal }),
    refetchInterval: (query) => (query.state.data?.orders.some((o) => o.sheetStatus === 'computing') ? computingPollMs : false),
  });
}

/** `GET /api/growth-orders/:id`: order, sheet, timeline and measurement reports; polled while the sheet computes. */
export function useGrowthOrder(id: string) {
  return useQuery({
    queryKey: growthOrderKey(id),
    queryFn: ({ signal }) => apiGet(orderPath(id), growthOrderDetailSchema, { signal }),
    enabled: id.length > 0,
    refetchInterval: (query) => (query.state.data?.order.sheetStatus === 'computing' || query.state.data?.order.yieldStatus === 'computing' ? computingPollMs : false),
  });
}

/** Writes on an order answer its whole detail: put it in the cache and refresh the lists. */
function useStoreDetail(id: string) {
  const queryClient = useQueryClient();
  return (detail: GrowthOrderDetail) => {
    queryClient.setQueryData(growthOrderKey(id), detail);
    void queryClient.invalidateQueries({ queryKey: growthListKey });
  };
}

/**
 * A 409 on `state` means someone closed the order meanwhile: reload it, so
 * the page shows the verdict and stops offering what the API now refuses.
 */
function useReloadWhenClosed() {
  const queryClient = useQueryClient();
  return (error: Error) => {
    if (error instanceof ApiError && error.status === 409 && error.fieldErrors.some((e) => e.field === 'state')) {
      void queryClient.invalidateQueries({ queryKey: growthQueryKey });
    }
  };
}

/** What every write on one order does with its answer. */
function useOrderWrite(id: string) {
  return { onSuccess: useStoreDetail(id), onError: useReloadWhenClosed() };
}

export const releaseResponseSchema = z.object({ order: growthOrderSchema });
export type ReleaseVariables = { runId: string; body: ReleaseRequest };

/** `POST /api/runs/:id/release`: a converged run's profile becomes a growth order. */
export function useReleaseRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ runId, body }: ReleaseVariables) =>
      apiSend('POST', `/api/runs/${encodeURIComponent(runId)}/release`, { json: body }, releaseResponseSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: growthQueryKey }),
  });
}

export type NextStateVariables = { state: 'accepted' | 'growing' | 'grown' | 'measured'; note: string };

/** `PUT /api/growth-orders/:id/state`: the grower's next step, with an optional note. */
export function useAdvanceOrder(id: string) {
  const handlers = useOrderWrite(id);
  return useMutation({
    mutationFn: (body: NextStateVariables) => apiSend('PUT', `${orderPath(id)}/state`, { json: body }, growthOrderDetailSchema),
    ...handlers,
  });
}

export type CloseVariables = { verdict: 'approved' | 'rejected'; reason: string };

/** `POST /api/growth-orders/:id/close`: the physicist's verdict and reason. */
export function useCloseOrder(id: string) {
  const handlers = useOrderWrite(id);
  return useMutation({
    mutationFn: (body: CloseVariables) => apiSend('POST', `${orderPath(id)}/close`, { json: body }, growthOrderDetailSchema),
    ...handlers,
  });
}

export type SheetSettingsVariables = { zones?: number; lossBudget?: number; measureTemperature?: number };

/** `PUT /api/growth-orders/:id/sheet`: K, loss budget (K) and check temperature (K); budget and temperature recompute. */
export function useUpdateSheetSettings(id: string) {
  const handlers = useOrderWrite(id);
  return useMutation({
    mutationFn: (body: SheetSettingsVariables) => apiSend('PUT', `${orderPath(id)}/sheet`, { json: body }, growthOrderDetailSchema),
    ...handlers,
  });
}

/** `PUT /api/growth-orders/:id/yield`: the doping scatter (decades, 1σ per zone); a worker recomputes the yield. */
export function useUpdateScatter(id: string) {
  const handlers = useOrderWrite(id);
  return useMutation({
    mutationFn: (body: { dopingScatter: number }) => apiSend('PUT', `${orderPath(id)}/yield`, { json: body }, growthOrderDetailSchema),
    ...handlers,
  });
}

export const uploadReportSchema = z.object({ report: measurementReportSchema });
export type UploadMeasurementsVariables = { file: PickedFile; temperature?: number; hallFactor?: number };

/** `POST /api/growth-orders/:id/measurements` (multipart `file`, optional `temperature` in K and `hallFactor`): all or nothing. */
export function useUploadMeasurements(id: string) {
  const queryClient = useQueryClient();
  const onError = useReloadWhenClosed();
  return useMutation({
    mutationFn: ({ file, temperature, hallFactor }: UploadMeasurementsVariables) => {
      const form = new FormData();
      if (temperature !== undefined) form.append('temperature', String(temperature));
      if (hallFactor !== undefined) form.append('hallFactor', String(hallFactor));
      appendFile(form, 'file', file);
      return apiSend('POST', `${orderPath(id)}/measurements`, { form }, uploadReportSchema);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: growthQueryKey }),
    onError,
  });
}

/** Download address of the sheet at the order's chosen K (CSV) or the whole sheet (JSON). */
export function growthSheetExportUrl(id: string, format: 'csv' | 'json'): string {
  return `${apiBaseUrl()}${orderPath(id)}/sheet.${format}`;
}

/** One upload's measurement report as CSV: every position's readings, bands and verdicts. */
export function measurementReportCsvUrl(id: string, uploadId: string): string {
  return `${apiBaseUrl()}${orderPath(id)}/report.csv?upload=${encodeURIComponent(uploadId)}`;
}
