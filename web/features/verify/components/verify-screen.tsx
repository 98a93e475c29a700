import { useRef, useState, type FormEvent } from 'react';
import { VERIFY_MAX_BYTES } from '#shared/schemas/revisions';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { useVerifyFile } from '../api/verify-file';
import { VerifyVerdict } from './verify-verdict';

const MAX_MIB = VERIFY_MAX_BYTES / (1024 * 1024);

/** Route /verify — pick a PDF you hold and learn whether it is an unmodified deliverable. */
export function VerifyScreen() {
  const verify = useVerifyFile();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  const pick = (f: File | null) => {
    verify.reset();
    setFile(f);
    setProblem(f && f.size > VERIFY_MAX_BYTES ? `That file is larger than ${MAX_MIB} MiB; a deliverable never is.` : null);
  };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!file) {
      setProblem('Choose the PDF to check first.');
      input.current?.focus();
      return;
    }
    if (problem) return;
    verify.mutate(file);
  };

  return (
    <>
      <PageHeader
        title="Verify a copy"
        description="Check that a report PDF is one the firm released and that nothing in it changed. The file is checked on the server and not kept."
      />
      <div className="flex max-w-3xl flex-col gap-6">
        <form onSubmit={submit} className="flex flex-col gap-4 rounded-lg border border-rule bg-sheet px-6 py-5">
          <div className="flex flex-col gap-1.5">
            <label htmlFor="verify-file" className="text-sm font-medium">
              PDF to check
            </label>
            <p id="verify-file-hint" className="text-sm text-ink-faint">
              A deliverable as downloaded or as received by e-mail; up to {MAX_MIB} MiB.
            </p>
            <input
              ref={input}
              id="verify-file"
              type="file"
              accept="application/pdf,.pdf"
              aria-describedby="verify-file-hint"
              aria-invalid={problem ? true : undefined}
              onChange={(e) => pick(e.target.files?.[0] ?? null)}
              className="text-sm file:mr-3 file:rounded-md file:border file:border-rule-strong file:bg-paper file:px-3 file:py-1.5 file:text-sm file:font-medium"
            />
            {problem && <p className="text-sm font-medium text-danger">{problem}</p>}
          </div>
          <div>
            <Button type="submit" variant="primary" busy={verify.isPending}>
              {verify.isPending ? 'Checking…' : 'Check this file'}
            </Button>
          </div>
        </form>
        {verify.isError && (
          <Banner tone="danger" title="The file could not be checked">
            {verify.error.message}
          </Banner>
        )}
        {verify.isSuccess && file && <VerifyVerdict result={verify.data} fileName={file.name} />}
      </div>
    </>
  );
}
