import { PageHeader } from '@/components/ui/card';
import { NotificationList } from '@/features/notifications/components/notification-list';

export function Component() {
  return (
    <>
      <PageHeader title="Notifications" lead="Pieces sent, reviews and other news for you, newest first." />
      <NotificationList />
    </>
  );
}
