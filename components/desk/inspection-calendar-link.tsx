/** Downloads one booked inspection as an iCalendar event, for any calendar program. */
export function InspectionCalendarLink({ inspectionId }: { inspectionId: string }) {
  return (
    <a
      href={`/api/v1/inspections/${inspectionId}/calendar-event`}
      download
      className="whitespace-nowrap text-xs"
      data-testid="inspection-ics"
    >
      Add to calendar (.ics)
    </a>
  );
}
