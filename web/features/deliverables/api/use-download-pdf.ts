import { useMutation } from '@tanstack/react-query';
import { fetchPdfLink } from './deliverable-queries';

/**
 * Asks for a fresh link and opens it. The link expires within minutes, so it is fetched on
 * each press rather than kept in the page. Where a new tab is blocked, the tab itself follows it
 * (the file is served as a download, so the page stays).
 */
export function useDownloadPdf() {
  return useMutation({
    mutationFn: fetchPdfLink,
    onSuccess: (link) => {
      const tab = window.open(link.url, '_blank');
      if (tab) tab.opener = null;
      else window.location.assign(link.url);
    },
  });
}
