import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { patternKeys } from '../query-keys';
import { patternResponseSchema, type PatternDetail } from '../types';

export type UploadPatternInput = { file: File; name?: string };

/** Upload an SVG, DXF (ASTM D6673) or Blockwright JSON file; the server imports it (422 with the reason when it cannot). */
export async function uploadPattern({ file, name }: UploadPatternInput): Promise<PatternDetail> {
  const form = new FormData();
  form.append('file', file);
  if (name !== undefined && name.trim() !== '') form.append('name', name.trim());
  const { pattern } = await apiClient.postForm('/patterns', form, patternResponseSchema);
  return pattern;
}

export function useUploadPattern({ onSuccess }: { onSuccess?: (pattern: PatternDetail) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadPattern,
    onSuccess: (pattern) => {
      queryClient.setQueryData(patternKeys.detail(pattern.id), pattern);
      void queryClient.invalidateQueries({ queryKey: patternKeys.lists() });
      onSuccess?.(pattern);
    },
  });
}
