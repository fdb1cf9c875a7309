import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { cycleReviewSchema, recordingCyclesSchema } from '../../../../shared/schemas/cycle';
import { api } from '../../../lib/api-client';
import { reviewApiSearch, type ReviewView } from '../model/review-query';

export const cycleKeys = {
  all: ['cycles'] as const,
  recording: (id: string) => ['cycles', 'recording', id] as const,
  review: (view: ReviewView) => ['cycles', 'review', reviewApiSearch(view)] as const,
};

export const getRecordingCycles = (id: string) => api.get(`/recordings/${encodeURIComponent(id)}/cycles`, recordingCyclesSchema);
export const getCycleReview = (view: ReviewView) => api.get(`/review/cycles?${reviewApiSearch(view)}`, cycleReviewSchema);

/** Where the browser downloads the selected cycles as CSV (the server answers with an attachment). */
export const reviewCsvUrl = (view: ReviewView) => {
  const search = new URLSearchParams(reviewApiSearch(view));
  search.set('format', 'csv');
  return `/api/review/cycles?${search}`;
};

// A finished recording's cycles never change; one still being recorded is read again while it grows.
export const recordingCyclesQuery = (id: string, isLive: boolean) =>
  queryOptions({ queryKey: cycleKeys.recording(id), queryFn: () => getRecordingCycles(id), staleTime: isLive ? 0 : Infinity, refetchInterval: isLive ? 5000 : false });
export const useRecordingCycles = (id: string, isLive: boolean) => useQuery(recordingCyclesQuery(id, isLive));

export const cycleReviewQuery = (view: ReviewView) =>
  queryOptions({ queryKey: cycleKeys.review(view), queryFn: () => getCycleReview(view), placeholderData: keepPreviousData });
export const useCycleReview = (view: ReviewView) => useQuery(cycleReviewQuery(view));
