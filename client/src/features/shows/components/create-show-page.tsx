import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@client/components/ui/page-header';
import { useCreateShow } from '../api/create-show';
import { ShowSettingsForm } from './show-settings-form';

export function CreateShowPage() {
  const create = useCreateShow();
  const navigate = useNavigate();
  return (
    <div>
      <PageHeader title="New show">It starts as a draft: nobody sees it until you open entries.</PageHeader>
      <ShowSettingsForm submitLabel="Create the show" busy={create.isPending} onSubmit={(input) => create.mutateAsync(input).then(({ event }) => navigate(`/shows/${event.id}`))} />
    </div>
  );
}
