import { PageLoading } from "@/components/layout/page-loading";

export default function Loading() {
  return <PageLoading />;
}
