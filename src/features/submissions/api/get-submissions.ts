import { queryOptions, useQuery } from '@tanstack/react-query';
import { LinkOptions, ProjectForPiece, SubmissionDTO, SubmissionList } from '@shared/schemas/submission';
import { api } from '@/lib/api-client';
import { submissionKeys } from './submission-keys';

const mySubmissionsQueryOptions = () =>
  queryOptions({ queryKey: submissionKeys.mine(), queryFn: () => api('/submissions', { schema: SubmissionList }) });

/** The signed-in apprentice's pieces, the most recently changed first. */
export const useMySubmissions = () => useQuery(mySubmissionsQueryOptions());

const submissionQueryOptions = (id: number) =>
  queryOptions({
    queryKey: submissionKeys.detail(id),
    queryFn: () => api(`/submissions/${id}`, { schema: SubmissionDTO }),
  });

export const useSubmission = (id: number) => useQuery(submissionQueryOptions(id));

/** A project as a new piece starts from it, with the piece already begun for it, if any. */
export const useProjectForPiece = (projectId: number) =>
  useQuery({
    queryKey: submissionKeys.project(projectId),
    queryFn: () => api(`/submissions/projects/${projectId}`, { schema: ProjectForPiece }),
    enabled: projectId > 0,
  });

export const useLinkOptions = () =>
  useQuery({
    queryKey: submissionKeys.linkOptions(),
    queryFn: () => api('/submissions/link-options', { schema: LinkOptions }),
    staleTime: 60_000,
  });
