import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';

interface ConflictBannerProps {
  onLoadLatest: () => void;
  onKeepCopy: () => void;
  copying: boolean;
  loading: boolean;
  copyError: string | null;
}

/**
 * Someone saved the study after this text was loaded. Nothing is lost either way: the author's
 * text becomes a new study, or the author chooses to read the newer version instead.
 */
export function ConflictBanner({ onLoadLatest, onKeepCopy, copying, loading, copyError }: ConflictBannerProps) {
  return (
    <Banner tone="warn" title="Someone else saved this study while you were writing">
      <p>Your latest changes are not saved here. Keep them as a new study, or open the newer version (your unsaved changes would then be left out of it).</p>
      <div className="mt-3 flex flex-wrap gap-2">
        <Button variant="primary" size="sm" onClick={onKeepCopy} busy={copying}>
          Keep my text as a new copy
        </Button>
        <Button size="sm" onClick={onLoadLatest} busy={loading}>
          Load the latest version
        </Button>
      </div>
      {copyError && <p className="mt-2 font-medium text-danger">The copy could not be made: {copyError}</p>}
    </Banner>
  );
}
