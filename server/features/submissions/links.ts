/** The in-app pages that notices and e-mails about submissions lead to (the client's routes of the same names). */
export const paths = {
  submission: (id: number) => `/pieces/${id}`,
  review: (submissionId: number) => `/review/${submissionId}`,
};
