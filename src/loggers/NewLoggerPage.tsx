import { useNavigate, useSearchParams } from 'react-router-dom';
import { useRooms } from '../rooms/queries';
import { PageHeader } from '../ui/PageHeader';
import { QueryResult } from '../ui/QueryResult';
import { LoggerForm } from './LoggerForm';
import { useCreateLogger } from './queries';

export function NewLoggerPage() {
  const rooms = useRooms();
  const create = useCreateLogger();
  const navigate = useNavigate();
  // Arriving from a room's page ("Add a logger here") preselects that room.
  const startRoom = Number(useSearchParams()[0].get('roomId')) || null;
  return (
    <>
      <PageHeader title="Add a logger" back={{ to: '/loggers', label: 'Loggers' }} />
      <QueryResult query={rooms} loading="Loading rooms…" failed="Could not load the rooms">
        {(list) => (
          <LoggerForm
            initial={{ label: '', serial: '', notes: '', roomId: list.some((r) => r.id === startRoom) ? startRoom : null }}
            rooms={list}
            submitLabel="Add logger"
            cancelTo="/loggers"
            busy={create.isPending}
            error={create.error}
            onSubmit={(body) => create.mutate(body, { onSuccess: (logger) => navigate(`/loggers/${logger.id}`) })}
          />
        )}
      </QueryResult>
    </>
  );
}
