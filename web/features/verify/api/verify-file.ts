import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { verifyResultSchema } from '#shared/schemas/revisions';
import { api } from '../../../lib/api-client';

// The verdict, whether the API wraps it as `{ result }` or answers with it bare.
const verdictBody = z.union([z.object({ result: verifyResultSchema }).transform((b) => b.result), verifyResultSchema]);

/** Sends a PDF the person holds as a multipart upload (field `file`) and returns the verdict. */
export function useVerifyFile() {
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('file', file, file.name);
      return api('/api/verify', { method: 'POST', body: form, schema: verdictBody });
    },
  });
}
