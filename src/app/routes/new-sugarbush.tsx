import { useNavigate } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { NewSugarbushForm } from '@/features/sugarbushes/components/new-sugarbush-form';

/** A signed-in person starts a stand of their own; its register opens next. */
export function NewSugarbushRoute() {
  const navigate = useNavigate();
  return (
    <>
      <title>Start a sugarbush · Clearwood</title>
      <PageHeader
        title="Start a sugarbush"
        subtitle="You become its owner. You can change all of this later in the stand's settings."
      />
      <NewSugarbushForm onCreated={(created) => navigate(paths.trees.href(created.id))} />
      <p className="mt-8 max-w-prose text-sm text-bark">
        Joining a sugarbush someone else runs? Ask its owner to invite you. The invitation arrives
        by e-mail.
      </p>
    </>
  );
}
