/** First-light reviews of a design: the list, one review with its checklist, asking and deciding. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api, designPath } from '../client';
import type { DecideReviewBody, RequestReviewBody, ReviewListItem, ReviewListResponse, ReviewRecord } from '../contracts';
import { keys } from './keys';

export type { ReviewListItem, ReviewRecord };

export function useReviews(designId: string) {
  return useQuery({ queryKey: keys.reviews(designId), queryFn: () => api.get<ReviewListResponse>(designPath(designId, '/reviews')).then((r) => r.reviews) });
}

export function useReview(designId: string, reviewId: string | null) {
  return useQuery({
    queryKey: keys.review(designId, reviewId ?? ''),
    queryFn: () => api.get<ReviewRecord>(designPath(designId, `/reviews/${encodeURIComponent(reviewId!)}`)),
    enabled: !!reviewId,
  });
}

export function useRequestReview(designId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (b: RequestReviewBody) => api.post<ReviewListItem>(designPath(designId, '/reviews'), b),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.reviews(designId) }),
  });
}

export function useDecideReview(designId: string, reviewId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (b: DecideReviewBody) => api.post<ReviewRecord>(designPath(designId, `/reviews/${encodeURIComponent(reviewId)}/decision`), b),
    onSuccess: (data) => qc.setQueryData(keys.review(designId, reviewId), data),
    onSettled: () => qc.invalidateQueries({ queryKey: keys.reviews(designId) }),
  });
}
