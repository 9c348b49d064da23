import { ProblemPage } from "@/components/layout/problem-page";

export default function NotFound() {
  return (
    <ProblemPage title="Page not found">
      There is nothing at this address, or it is not yours to see. Check the link, or start again from your home page.
    </ProblemPage>
  );
}
