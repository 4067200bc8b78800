import { Button, Input, makeStyles } from '@fluentui/react-components';
import { Add20Regular, Search20Regular } from '@fluentui/react-icons';
import { useTableStyles } from './table-styles';

const useStyles = makeStyles({
  filter: { width: '300px', maxWidth: '100%' },
});

interface FilterToolbarProps {
  /** The filter box's accessible name ("Filter links by name"). */
  filterLabel: string;
  placeholder: string;
  filter: string;
  onFilterChange: (value: string) => void;
  /** The add button's text ("Add link"). */
  addLabel: string;
  onAdd: () => void;
}

/** Above a list table: a box that filters its rows by name, and a button that adds one. */
export function FilterToolbar({
  filterLabel,
  placeholder,
  filter,
  onFilterChange,
  addLabel,
  onAdd,
}: FilterToolbarProps) {
  const styles = useStyles();
  const tableStyles = useTableStyles();
  return (
    <div className={tableStyles.toolbar}>
      <Input
        className={styles.filter}
        aria-label={filterLabel}
        placeholder={placeholder}
        contentBefore={<Search20Regular aria-hidden />}
        value={filter}
        onChange={(_, data) => onFilterChange(data.value)}
      />
      <Button appearance="primary" icon={<Add20Regular />} onClick={onAdd}>
        {addLabel}
      </Button>
    </div>
  );
}
