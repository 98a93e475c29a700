import { StatusMessage } from './status-message';

export function ForbiddenScreen() {
  return (
    <StatusMessage code="403" title="Not allowed">
      Your role does not give access to this page. If you need it for your work, ask an administrator.
    </StatusMessage>
  );
}
