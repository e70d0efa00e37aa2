import { Spinner } from "@/components/ui/states";

export default function Loading() {
  return (
    <div className="py-10">
      <Spinner label="Loading the page" />
    </div>
  );
}
