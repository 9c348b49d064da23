import { NOT_FOUND_TEXT, ProblemContent } from "@/components/layout/problem-page";

// Rendered inside this group's layout, which already has the header and the <main> landmark.
export default function NotFound() {
  return <ProblemContent title={NOT_FOUND_TEXT.title}>{NOT_FOUND_TEXT.body}</ProblemContent>;
}
