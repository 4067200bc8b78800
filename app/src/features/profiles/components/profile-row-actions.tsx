import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import type { ProfileRow } from '../api/types';

const useStyles = makeStyles({
  row: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
});

interface ProfileRowActionsProps {
  profile: ProfileRow;
  canPublish: boolean;
  canDelete: boolean;
  busy: boolean;
  onPublish: (published: boolean) => void;
  onDelete: () => void;
  size?: 'small' | 'medium';
}

/** Publish/unpublish and delete (with a confirmation) for one profile. */
export function ProfileRowActions({
  profile,
  canPublish,
  canDelete,
  busy,
  onPublish,
  onDelete,
  size = 'small',
}: ProfileRowActionsProps) {
  const styles = useStyles();
  const [confirming, setConfirming] = useState(false);
  return (
    <div className={styles.row}>
      {canPublish && (
        <Button
          size={size}
          disabled={busy}
          aria-label={`${profile.published ? 'Unpublish' : 'Publish'} ${profile.name}`}
          onClick={() => onPublish(!profile.published)}
        >
          {profile.published ? 'Unpublish' : 'Publish'}
        </Button>
      )}
      {canDelete && (
        <Dialog open={confirming} onOpenChange={(_, data) => setConfirming(data.open)}>
          <DialogTrigger disableButtonEnhancement>
            <Button size={size} disabled={busy} aria-label={`Delete ${profile.name}`}>
              Delete
            </Button>
          </DialogTrigger>
          <DialogSurface>
            <DialogBody>
              <DialogTitle>Delete “{profile.name}”?</DialogTitle>
              <DialogContent>
                The profile leaves the library. Studies that already used it keep their results.
              </DialogContent>
              <DialogActions>
                <DialogTrigger disableButtonEnhancement>
                  <Button appearance="secondary">Keep it</Button>
                </DialogTrigger>
                <Button
                  appearance="primary"
                  onClick={() => {
                    setConfirming(false);
                    onDelete();
                  }}
                >
                  Delete
                </Button>
              </DialogActions>
            </DialogBody>
          </DialogSurface>
        </Dialog>
      )}
    </div>
  );
}
