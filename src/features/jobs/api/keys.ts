export const jobsKeys = {
  all: ['jobs'] as const,
};
