/** The reading view of a study (route /studies/:id/read). */
export function StudyReaderScreen() {
  return <p>Study</p>;
}
