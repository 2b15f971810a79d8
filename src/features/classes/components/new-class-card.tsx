import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { useCreateClass } from '../api/save-class';
import { ClassFormFields } from './class-form';

/** "New class" opens the form in place; a created class opens its own page, where people are invited. */
export function NewClassCard() {
  const [open, setOpen] = useState(false);
  const create = useCreateClass();
  const navigate = useNavigate();
  if (!open) return <Button onClick={() => setOpen(true)}>New class</Button>;
  return (
    <Card className="w-full">
      <h2 className="mb-4 font-serif text-xl">New class</h2>
      <ClassFormFields
        submitLabel="Create class"
        busy={create.isPending}
        error={create.error}
        onCancel={() => setOpen(false)}
        onSubmit={(input, setServerErrors) =>
          create.mutate(input, {
            onSuccess: (cls) => {
              toast.success(`${cls.name} is created.`);
              navigate(paths.class(cls.id));
            },
            onError: setServerErrors,
          })
        }
      />
    </Card>
  );
}
