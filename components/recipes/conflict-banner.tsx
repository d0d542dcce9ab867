import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import type { SaveFailure } from '@/hooks/use-recipe-autosave';
import { formatLogTime } from '@/lib/format';
import type { RecipeDetail } from '@/shared/schemas/recipe-api';

type ConflictBannerProps = {
  failure: SaveFailure | null;
  /** Refused-save messages that belong to no step (the name, the step count). */
  otherErrors: string[];
  onLoadTheirs: (current: RecipeDetail) => void;
  onOverwrite: (current: RecipeDetail) => void;
};

/** A save the server refused: changed elsewhere (choose whose version stays), or not valid. */
export function ConflictBanner({ failure, otherErrors, onLoadTheirs, onOverwrite }: ConflictBannerProps) {
  if (failure?.kind === 'conflict') {
    const { current } = failure;
    return (
      <Banner tone="danger" title="Changed elsewhere" message={`Version ${current.version} was saved ${formatLogTime(current.updatedAt)} in another tab or device. Your edits are kept here until you choose.`} testID="composer-conflict">
        <Button label="Load their version" variant="secondary" size="small" onPress={() => onLoadTheirs(current)} testID="composer-conflict-load" />
        <Button label="Overwrite with mine" variant="danger" size="small" onPress={() => onOverwrite(current)} testID="composer-conflict-overwrite" />
      </Banner>
    );
  }
  if (failure?.kind === 'invalid') {
    const message = otherErrors.length > 0 ? otherErrors.join(' ') : 'The marked steps need attention; your edits are kept.';
    return <Banner tone="danger" title="Not saved: some steps need attention" message={message} testID="composer-invalid" />;
  }
  return null;
}
