/** The address of one of a rabbitry's analysis reports. */
export const analyticsUrl = (rabbitryId: string, report: string) =>
  `/api/rabbitries/${encodeURIComponent(rabbitryId)}/analytics/${report}`;
