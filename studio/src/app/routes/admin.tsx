export { AdminUsersPage as AdminUsersRoute, AdminWorkshopsPage as AdminWorkshopsRoute } from '@/features/admin/components/admin-pages';
