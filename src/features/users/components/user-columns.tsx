import { ROLE_LABELS, ROLES, type Role } from '../../../../shared/api/roles';
import type { User } from '../../../../shared/api/users';
import { Badge, Button, Select, tableColumnHelper, type TableColumn } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';

/** What a row's controls ask the page to do. */
export interface UserRowActions {
  onRole: (user: User, role: Role) => void;
  onToggleActive: (user: User) => void;
  /** Id of the user whose change is in flight (its controls are disabled). */
  busyId: number | null;
}

const column = tableColumnHelper<User>();

/** Columns of the Users table; build once per set of actions (memoised by the caller). */
export function userColumns({
  onRole,
  onToggleActive,
  busyId,
}: UserRowActions): TableColumn<User>[] {
  return column.columns([
    column.accessor('name', {
      header: 'Name',
      cell: (info) => <span className="font-medium text-sand-900">{info.getValue()}</span>,
    }),
    column.accessor('email', { header: 'E-mail' }),
    column.accessor('role', {
      header: 'Role',
      cell: (info) => {
        const user = info.row.original;
        return (
          <>
            <label htmlFor={`role-${user.id}`} className="sr-only">
              Role of {user.name}
            </label>
            <Select
              id={`role-${user.id}`}
              value={user.role}
              disabled={busyId === user.id}
              onChange={(event) => onRole(user, event.target.value as Role)}
              controlSize="sm"
              className="min-w-44"
            >
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_LABELS[r]}
                </option>
              ))}
            </Select>
          </>
        );
      },
    }),
    column.accessor('customerName', {
      header: 'Builder company',
      cell: (info) => info.getValue() ?? '—',
    }),
    column.accessor('active', {
      header: 'Status',
      cell: (info) =>
        info.getValue() ? <Badge tone="success">Active</Badge> : <Badge>Deactivated</Badge>,
    }),
    column.accessor('lastSignInAt', {
      header: 'Last sign-in',
      cell: (info) => (
        <span className="whitespace-nowrap">
          {info.getValue() ? formatDateTime(info.getValue()) : 'Never'}
        </span>
      ),
    }),
    column.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      cell: (info) => {
        const user = info.row.original;
        return (
          <Button
            size="sm"
            variant={user.active ? 'ghost' : 'secondary'}
            disabled={busyId === user.id}
            onClick={() => onToggleActive(user)}
            aria-label={`${user.active ? 'Deactivate' : 'Reactivate'} ${user.name}`}
          >
            {user.active ? 'Deactivate' : 'Reactivate'}
          </Button>
        );
      },
    }),
  ]);
}
