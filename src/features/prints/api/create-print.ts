import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '../../../lib/api-client';
import { printKeys } from '../query-keys';
import { printResponseSchema, type PrintJob, type PrintOptions } from './schemas';

export type CreatePrintInput = { makeId: string; options: PrintOptions };

/** Queue a print of a make's newest revision; the server answers at once (202) with the job. */
export async function createPrint(input: CreatePrintInput): Promise<PrintJob> {
  const { print } = await apiClient.post('/prints', input, printResponseSchema);
  return print;
}

export function useCreatePrint({ onSuccess }: { onSuccess?: (print: PrintJob) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPrint,
    onSuccess: async (print) => {
      queryClient.setQueryData(printKeys.detail(print.id), print);
      await queryClient.invalidateQueries({ queryKey: printKeys.lists() });
      onSuccess?.(print);
    },
  });
}
