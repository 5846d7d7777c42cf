import { Card, PageHeader } from "@/components/ui/page";
import { roleLabel } from "@/lib/labels";
import { useSession } from "@/features/auth/api/session";

export function HomeRoute() {
  const { data } = useSession();
  if (!data) return null;
  return (
    <>
      <PageHeader title={`Hello, ${data.user.displayName}`} eyebrow={roleLabel[data.user.role]} />
      <Card>
        <p>Your transfers appear here.</p>
      </Card>
    </>
  );
}
