import { useQuery } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router-dom';
import { NoAccess } from '@/components/ui/no-access';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { useCreatePrint } from '../api/create-print';
import { printQueries } from '@/lib/catalogue';
import { useUpdatePrint } from '../api/update-print';
import { CuratorialForm } from './curatorial-form';
import { EMPTY_PRINT, formValuesOf } from './form-values';
import { PrintForm } from './print-form';

export function PrintCreatePage() {
  const create = useCreatePrint();
  const navigate = useNavigate();
  const can = useCan();
  if (!can('prints:write')) {
    return (
      <>
        <PageHeader title="New print" eyebrow="Catalogue" />
        <NoAccess area="New prints" needs="prints:write" />
      </>
    );
  }
  return (
    <>
      <PageHeader title="New print" eyebrow="Catalogue" />
      <PrintForm
        defaultValues={EMPTY_PRINT}
        submitLabel="Create print"
        pending={create.isPending}
        error={create.error}
        draftKey="new"
        save={create.mutateAsync}
        onSaved={(print) => navigate(paths.print(print.id))}
      />
    </>
  );
}

export function PrintEditPage() {
  const id = Number(useParams().id);
  const print = useQuery(printQueries.detail(id));
  const update = useUpdatePrint(id);
  const navigate = useNavigate();
  if (print.isPending) return <Loading />;
  if (print.error) return <ErrorNotice error={print.error} />;
  const record = print.data;
  const done = () => navigate(paths.print(id));

  return (
    <>
      <PageHeader title={`Edit ${record.title}`} accession={record.accessionNumber} />
      {record.can.edit ? (
        <PrintForm
          defaultValues={formValuesOf(record)}
          submitLabel="Save changes"
          pending={update.isPending}
          error={update.error}
          draftKey={String(id)}
          save={update.mutateAsync}
          onSaved={done}
          photographs={record.assets}
        />
      ) : record.can.editCuratorial ? (
        <CuratorialForm
          print={record}
          pending={update.isPending}
          error={update.error}
          onSubmit={(values, { onError, beforeLeave }) =>
            update.mutate(values, {
              onSuccess: () => {
                beforeLeave();
                done();
              },
              onError,
            })
          }
        />
      ) : (
        <p>Your role may read this record but not change it.</p>
      )}
    </>
  );
}
