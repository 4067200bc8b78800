import {
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  mergeClasses,
} from '@fluentui/react-components';
import { useTableStyles } from '@/components/data-table/table-styles';
import type { UploadRowError } from '../api/types';

const useStyles = makeStyles({
  wrap: { maxHeight: '320px', overflowY: 'auto' },
  narrow: { width: '80px' },
  column: { width: '200px' },
});

/** Every row the server refused, with the line of the file and the reason. */
export function UploadRowErrors({ rows }: { rows: UploadRowError[] }) {
  const styles = useStyles();
  const table = useTableStyles();
  return (
    <div className={mergeClasses(table.wrapper, styles.wrap)}>
      <Table aria-label="Rows the server refused" size="small">
        <TableHeader>
          <TableRow>
            <TableHeaderCell className={styles.narrow}>Row</TableHeaderCell>
            <TableHeaderCell className={styles.narrow}>Line</TableHeaderCell>
            <TableHeaderCell className={styles.column}>Column</TableHeaderCell>
            <TableHeaderCell>Problem</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {rows.map((row, index) => (
            <TableRow key={`${row.line}-${row.column ?? ''}-${index}`}>
              <TableCell>{row.row === 0 ? 'File' : row.row}</TableCell>
              <TableCell>{row.line ?? '—'}</TableCell>
              <TableCell>{row.column ?? '—'}</TableCell>
              <TableCell>{row.detail ? `${row.detail} (${row.reason})` : row.reason}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}
