import type { NetView } from '@hopwise/common';
import {
  Badge,
  Button,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
} from '@fluentui/react-components';
import { formatKHz } from './channels';

interface NetsTableProps {
  nets: NetView[];
  selectedId?: number;
  onOpen: (net: NetView) => void;
  onEdit: (net: NetView) => void;
  onDelete: (net: NetView) => void;
}

export function NetsTable({ nets, selectedId, onOpen, onEdit, onDelete }: NetsTableProps) {
  return (
    <Table aria-label="Nets" size="small">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Net</TableHeaderCell>
          <TableHeaderCell>Control station</TableHeaderCell>
          <TableHeaderCell>Members</TableHeaderCell>
          <TableHeaderCell>Channels</TableHeaderCell>
          <TableHeaderCell>Schedule</TableHeaderCell>
          <TableHeaderCell>Actions</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {nets.map((net) => (
          <TableRow key={net.id} aria-selected={net.id === selectedId}>
            <TableCell>{net.name}</TableCell>
            <TableCell>{net.controlStation?.name ?? '—'}</TableCell>
            <TableCell>{net.memberStations.map((s) => s.name).join(', ')}</TableCell>
            <TableCell>{net.channelsKHz.map(formatKHz).join(' · ')}</TableCell>
            <TableCell>
              {net.latestVersion ? (
                <Badge appearance="tint" shape="rounded">{`published v${net.latestVersion}`}</Badge>
              ) : (
                <Badge appearance="outline" shape="rounded" color="informative">
                  not published
                </Badge>
              )}
            </TableCell>
            <TableCell>
              <Button size="small" appearance="primary" onClick={() => onOpen(net)}>
                {net.canManage ? 'Schedule' : 'View schedule'}
              </Button>{' '}
              {net.canManage && (
                <>
                  <Button size="small" onClick={() => onEdit(net)} aria-label={`Edit ${net.name}`}>
                    Edit
                  </Button>{' '}
                  <Button
                    size="small"
                    onClick={() => onDelete(net)}
                    aria-label={`Delete ${net.name}`}
                  >
                    Delete
                  </Button>
                </>
              )}
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
