import { useNavigate } from 'react-router-dom';
import { NotFoundPage } from '../layout/NotFoundPage';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { useIdParam } from '../ui/useIdParam';
import { LoggerForm } from './LoggerForm';
import { useLogger, useUpdateLogger } from './queries';

function EditLogger({ id }: { id: number }) {
  const logger = useLogger(id);
  const update = useUpdateLogger(id);
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title={logger.data ? `Edit ${logger.data.label}` : 'Edit logger'} back={{ to: `/loggers/${id}`, label: logger.data?.label ?? 'Logger' }} />
      <QueryResult query={logger} loading="Loading the logger…" failed="Could not load the logger">
        {(l) => (
          <LoggerForm
            initial={{ label: l.label, serial: l.serial, notes: l.notes }}
            submitLabel="Save changes"
            cancelTo={`/loggers/${id}`}
            busy={update.isPending}
            error={update.error}
            // The room is not edited here: a change of room is a move, recorded with its time on the logger's page.
            onSubmit={({ label, serial, notes }) => update.mutate({ label, serial, notes }, { onSuccess: () => navigate(`/loggers/${id}`) })}
          />
        )}
      </QueryResult>
    </>
  );
}

export function EditLoggerPage() {
  const id = useIdParam();
  return id === null ? <NotFoundPage what="logger" /> : <EditLogger id={id} />;
}
