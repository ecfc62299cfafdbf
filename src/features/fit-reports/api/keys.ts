export const fitReportKeys = {
  all: ['fit-reports'] as const,
  list: ['fit-reports', 'list'] as const,
  detail: (id: string) => ['fit-reports', 'detail', id] as const,
  shared: (token: string) => ['fit-reports', 'shared', token] as const,
};
