import { queryOptions, useQuery } from '@tanstack/react-query';
import { StorageUsage } from '@shared/schemas/upload';
import { api } from '@/lib/api-client';
import { uploadKeys } from './upload-keys';

export const storageUsageOptions = () =>
  queryOptions({
    queryKey: uploadKeys.usage(),
    queryFn: () => api('/uploads/usage', { schema: StorageUsage }),
  });

export const useStorageUsage = () => useQuery(storageUsageOptions());
