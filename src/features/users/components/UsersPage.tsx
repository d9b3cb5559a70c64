import { useMemo, useState } from 'react';
import type { Role } from '../../../../shared/api/roles';
import { ROLE_LABELS } from '../../../../shared/api/roles';
import type { User } from '../../../../shared/api/users';
import {
  Alert,
  Button,
  Card,
  DataTable,
  Dialog,
  EmptyState,
  ErrorMessage,
  PageHeader,
  Pager,
  QueryState,
  SearchBox,
} from '../../../components/ui';
import { useListParams } from '../../../lib/use-list-params';
import { useUsers } from '../api/list-users';
import { useUpdateUser } from '../api/update-user';
import { AddUserForm } from './AddUserForm';
import { userColumns } from './user-columns';

/** `/users` (admin): the plant's users; add, change role, deactivate or reactivate. */
export function UsersPage() {
  const { params, update: updateParams } = useListParams();
  const users = useUsers(params);
  const updateUser = useUpdateUser();
  const [adding, setAdding] = useState(false);
  const [confirming, setConfirming] = useState<User | null>(null);
  const [notice, setNotice] = useState<string | null>(null);

  const busyId = updateUser.isPending ? updateUser.variables.id : null;
  const columns = useMemo(
    () =>
      userColumns({
        busyId,
        onToggleActive: setConfirming,
        onRole: (user: User, role: Role) =>
          updateUser.mutate(
            { id: user.id, change: { role } },
            { onSuccess: (u) => setNotice(`${u.name} is now ${ROLE_LABELS[u.role]}.`) },
          ),
      }),
    // `mutate` is stable; re-create columns only when the busy row changes.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [busyId],
  );

  const confirmToggle = () => {
    if (!confirming) return;
    const active = !confirming.active;
    updateUser.mutate(
      { id: confirming.id, change: { active } },
      {
        onSuccess: (u) => {
          setConfirming(null);
          setNotice(`${u.name} was ${active ? 'reactivated' : 'deactivated'}.`);
        },
      },
    );
  };

  return (
    <>
      <PageHeader
        title="Users"
        description="People who can sign in to this plant, and builder users of your customers."
        actions={<Button onClick={() => setAdding(true)}>Add user</Button>}
      />
      {notice ? (
        <Alert tone="success" className="mb-4">
          {notice}
        </Alert>
      ) : null}
      {updateUser.error && !confirming ? (
        <ErrorMessage className="mb-4" title="The change was not saved" error={updateUser.error} />
      ) : null}
      <div className="mb-4">
        <SearchBox
          label="Search users"
          placeholder="Name or e-mail"
          value={params.q}
          onSearch={(q) => updateParams({ q, page: 1 })}
        />
      </div>
      <Card flush>
        <QueryState query={users} what="users">
          {(page) => (
            <>
              <DataTable
                caption="Users"
                columns={columns}
                data={page.items}
                rowKey={(u) => u.id}
                empty={
                  <EmptyState title={params.q ? `No users match “${params.q}”` : 'No users yet'} />
                }
              />
              <Pager
                page={page.page}
                pageSize={page.pageSize}
                total={page.total}
                onPage={(p) => updateParams({ page: p })}
              />
            </>
          )}
        </QueryState>
      </Card>

      <Dialog open={adding} title="Add user" onClose={() => setAdding(false)}>
        <AddUserForm
          onCancel={() => setAdding(false)}
          onDone={(user) => {
            setAdding(false);
            setNotice(`${user.name} was added as ${ROLE_LABELS[user.role]}.`);
          }}
        />
      </Dialog>

      <Dialog
        open={confirming !== null}
        title={confirming?.active ? 'Deactivate user?' : 'Reactivate user?'}
        onClose={() => setConfirming(null)}
        footer={
          <>
            <Button variant="secondary" onClick={() => setConfirming(null)}>
              Cancel
            </Button>
            <Button
              variant={confirming?.active ? 'danger' : 'primary'}
              busy={updateUser.isPending}
              onClick={confirmToggle}
            >
              {confirming?.active ? 'Deactivate' : 'Reactivate'}
            </Button>
          </>
        }
      >
        {confirming?.active ? (
          <p>
            <strong>{confirming.name}</strong> will be signed out and can no longer sign in. Their
            records stay. You can reactivate them later.
          </p>
        ) : (
          <p>
            <strong>{confirming?.name}</strong> will be able to sign in again with their existing
            password.
          </p>
        )}
        {updateUser.error && confirming ? (
          <ErrorMessage className="mt-3" error={updateUser.error} />
        ) : null}
      </Dialog>
    </>
  );
}
