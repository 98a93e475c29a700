import { StatusMessage } from './status-message';

export function NotFoundScreen() {
  return (
    <StatusMessage code="404" title="Page not found">
      There is no page at this address. It may have moved, or the link may be mistyped.
    </StatusMessage>
  );
}
