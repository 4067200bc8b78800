import { useState } from 'react';

/** A form dialog that adds a new item or edits an existing one: whether it is open, and on what. */
export function useEditDialog<T>() {
  const [open, setOpen] = useState(false);
  const [item, setItem] = useState<T | undefined>();
  const openFor = (target: T | undefined) => {
    setItem(target);
    setOpen(true);
  };
  return {
    open,
    setOpen,
    /** The item being edited; undefined while adding. */
    item,
    openNew: () => openFor(undefined),
    openEdit: (target: T) => openFor(target),
  };
}
