import { CautionNote } from '../../components/ui/caution-note';

export function SiteFooter() {
  return (
    <footer className="border-t border-calico-300 bg-calico-100/80 px-6 py-5">
      <CautionNote className="mx-auto max-w-5xl" />
    </footer>
  );
}
