import { PageSkeleton } from "@/components/ui/page-skeleton";

// Every staff role sees the queue; the (staff) layout above this boundary already decided that.
export default function Loading() {
  return <PageSkeleton label="Loading the work queue…" />;
}
