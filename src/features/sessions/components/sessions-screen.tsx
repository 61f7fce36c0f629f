import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { RegisterScreen } from '../../../components/layouts/register-screen';
import { Button } from '../../../components/ui/button';
import { useListParams } from '../../../lib/use-list-params';
import { readSessionFilters, sessionsExportUrl, sessionsQueries } from '../api/sessions-queries';
import { CreateSessionDialog } from './create-session-dialog';
import { sessionColumns } from './sessions-columns';
import { isSessionFiltered, SessionsFilters } from './sessions-filters';

interface Props {
  canWrite: boolean;
  me: { id: number; displayName: string };
}

export function SessionsScreen({ canWrite, me }: Props) {
  const params = useListParams(readSessionFilters);
  const { filters, update } = params;
  const list = useQuery(sessionsQueries.list(filters));
  const [creating, setCreating] = useState(false);

  return (
    <RegisterScreen
      title="Inoculation sessions"
      description="Who inoculated, where, and which procedure they followed. Jars point at their session, so contamination can be traced to technique or workspace."
      exportHref={sessionsExportUrl(filters)}
      actions={
        canWrite && (
          <Button icon="plus" onClick={() => setCreating(true)}>
            New session
          </Button>
        )
      }
      filters={<SessionsFilters filters={filters} onChange={update} />}
      columns={sessionColumns}
      query={list}
      params={params}
      empty={{
        filtered: isSessionFiltered(filters),
        none: 'No sessions recorded yet.',
        noMatch: 'No sessions match these filters.',
      }}
    >
      {canWrite && <CreateSessionDialog open={creating} onClose={() => setCreating(false)} me={me} />}
    </RegisterScreen>
  );
}
