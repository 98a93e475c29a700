import { Banner } from '../components/ui/banner';
import { Button } from '../components/ui/button';
import { isApiError } from '../lib/api-error';
import { StatusMessage } from './status-message';

interface QueryErrorNoticeProps {
  error: Error;
  /** What was being loaded, for the 404 message: "engagement", "list of people". */
  what: string;
  onRetry?: () => void;
}

/** The one way screens report a failed load: clear words for 403 and 404, retry otherwise. */
export function QueryErrorNotice({ error, what, onRetry }: QueryErrorNoticeProps) {
  if (isApiError(error) && error.status === 403) {
    return (
      <StatusMessage code="403" title="Not allowed">
        You do not have access to this {what}. If you should, ask an administrator to add you.
      </StatusMessage>
    );
  }
  if (isApiError(error) && error.status === 404) {
    return (
      <StatusMessage code="404" title={`No such ${what}`}>
        It does not exist, or you are not one of its members. Check the link, or ask an administrator to add you.
      </StatusMessage>
    );
  }
  return (
    <Banner tone="danger" title={`The ${what} could not be loaded`}>
      <p>{error.message}</p>
      {onRetry && (
        <Button size="sm" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      )}
    </Banner>
  );
}
