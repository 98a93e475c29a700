/** The study editor screen (route /studies/:id). Filled in by the editor work. */
export function StudyEditorScreen() {
  return <p>Study editor</p>;
}
