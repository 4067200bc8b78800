import { Button } from '@fluentui/react-components';

interface EditDeleteButtonsProps {
  /** The row's name, for the buttons' accessible names ("Edit Bern", "Delete Bern"). */
  name: string;
  disabled?: boolean;
  onEdit: () => void;
  onDelete: () => void;
}

/** A table row's Edit and Delete buttons. */
export function EditDeleteButtons({ name, disabled, onEdit, onDelete }: EditDeleteButtonsProps) {
  return (
    <>
      <Button size="small" disabled={disabled} aria-label={`Edit ${name}`} onClick={onEdit}>
        Edit
      </Button>
      <Button size="small" disabled={disabled} aria-label={`Delete ${name}`} onClick={onDelete}>
        Delete
      </Button>
    </>
  );
}
