import { CatalogueImportScreen } from '@/components/catalogues/catalogue-import-screen';

export default function CatalogueImportRoute() {
  return <CatalogueImportScreen />;
}
