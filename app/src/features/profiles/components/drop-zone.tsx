import { Body1, Caption1, makeStyles, mergeClasses, tokens } from '@fluentui/react-components';
import { ArrowUpload24Regular } from '@fluentui/react-icons';
import { useId, useRef, useState, type DragEvent } from 'react';

const useStyles = makeStyles({
  zone: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'center',
    justifyContent: 'center',
    gap: tokens.spacingVerticalS,
    width: '100%',
    minHeight: '150px',
    padding: tokens.spacingVerticalXL,
    border: `${tokens.strokeWidthThick} dashed ${tokens.colorBrandStroke2}`,
    borderRadius: tokens.borderRadiusXLarge,
    backgroundColor: tokens.colorNeutralBackground2,
    color: tokens.colorNeutralForeground2,
    cursor: 'pointer',
    font: 'inherit',
    textAlign: 'center',
    ':hover': { backgroundColor: tokens.colorBrandBackground2 },
    ':focus-visible': {
      outline: `${tokens.strokeWidthThick} solid ${tokens.colorStrokeFocus2}`,
      outlineOffset: '2px',
    },
  },
  dragging: {
    backgroundColor: tokens.colorBrandBackground2,
    border: `${tokens.strokeWidthThick} solid ${tokens.colorBrandStroke1}`,
  },
  disabled: { cursor: 'not-allowed', opacity: 0.6 },
  icon: { fontSize: '32px', color: tokens.colorBrandForeground1 },
  input: { display: 'none' },
});

interface DropZoneProps {
  /** What the button says, e.g. "Drop a CSV file here or choose one". */
  label: string;
  hint?: string;
  accept?: string;
  disabled?: boolean;
  file: File | null;
  onFile: (file: File) => void;
}

/**
 * A drop target that is also an ordinary button: Enter/Space or a click opens the file picker, so
 * keyboard and screen-reader users get the same thing as a drag and drop.
 */
export function DropZone({ label, hint, accept, disabled, file, onFile }: DropZoneProps) {
  const styles = useStyles();
  const inputRef = useRef<HTMLInputElement>(null);
  const [dragging, setDragging] = useState(false);
  const hintId = useId();

  const take = (files: FileList | null) => {
    const chosen = files?.[0];
    if (chosen) onFile(chosen);
  };
  const onDrop = (event: DragEvent<HTMLButtonElement>) => {
    event.preventDefault();
    setDragging(false);
    if (!disabled) take(event.dataTransfer.files);
  };

  return (
    <>
      <button
        type="button"
        className={mergeClasses(
          styles.zone,
          dragging && styles.dragging,
          disabled && styles.disabled,
        )}
        disabled={disabled}
        aria-describedby={hintId}
        onClick={() => inputRef.current?.click()}
        onDragEnter={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragOver={(event) => {
          event.preventDefault();
          event.dataTransfer.dropEffect = 'copy';
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
      >
        <ArrowUpload24Regular className={styles.icon} aria-hidden />
        <Body1>{label}</Body1>
        <Caption1 id={hintId}>
          {file ? `Chosen: ${file.name} (${(file.size / 1024).toFixed(1)} kB)` : hint}
        </Caption1>
      </button>
      <input
        ref={inputRef}
        className={styles.input}
        type="file"
        accept={accept}
        tabIndex={-1}
        aria-hidden
        data-testid="upload-file-input"
        onChange={(event) => {
          take(event.target.files);
          // Choosing the same file again must fire another change.
          event.target.value = '';
        }}
      />
    </>
  );
}
