/**
 * A brand name as brand.name_norm holds it. The catalog writes name_norm with this same rule
 * (trim, lower case) in catalog-edit.service and the seeder; a file's "QUAYWELL" finds "Quaywell".
 */
export function brandNameNorm(name: string): string {
  return name.trim().toLowerCase();
}
