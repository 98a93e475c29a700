import { createBrowserRouter, Navigate } from 'react-router-dom';
import { AppLayout } from './app-layout';
import { lazyScreen } from './lazy-screen';
import { NotFoundScreen } from './not-found-screen';
import { paths } from './paths';
import { PublicLayout } from './public-layout';
import { RequireRole } from './require-role';
import { RequireSession } from './require-session';
import { RouteErrorScreen } from './route-error-screen';

// Every screen is its own chunk: the first screen loads only the shell and itself.
const SignInScreen = lazyScreen(() => import('../features/auth/components/sign-in-screen'), 'SignInScreen');
const ForgotPasswordScreen = lazyScreen(() => import('../features/auth/components/forgot-password-screen'), 'ForgotPasswordScreen');
const ResetPasswordScreen = lazyScreen(() => import('../features/auth/components/reset-password-screen'), 'ResetPasswordScreen');
const AcceptInvitationScreen = lazyScreen(() => import('../features/auth/components/accept-invitation-screen'), 'AcceptInvitationScreen');
const EngagementsScreen = lazyScreen(() => import('../features/engagements/components/engagements-screen'), 'EngagementsScreen');
const EngagementOverviewScreen = lazyScreen(() => import('../features/engagements/components/engagement-overview-screen'), 'EngagementOverviewScreen');
const DatasetsScreen = lazyScreen(() => import('../features/datasets/components/datasets-screen'), 'DatasetsScreen');
const DatasetScreen = lazyScreen(() => import('../features/datasets/components/dataset-screen'), 'DatasetScreen');
const AssumptionsScreen = lazyScreen(() => import('../features/assumptions/components/assumptions-screen'), 'AssumptionsScreen');
const AdminEngagementsScreen = lazyScreen(() => import('../features/engagements/components/admin-engagements-screen'), 'AdminEngagementsScreen');
const AdminUsersScreen = lazyScreen(() => import('../features/users/components/admin-users-screen'), 'AdminUsersScreen');
const AuditScreen = lazyScreen(() => import('../features/audit/components/audit-screen'), 'AuditScreen');
const MailboxScreen = lazyScreen(() => import('../features/mailbox/components/mailbox-screen'), 'MailboxScreen');
// The editor (TipTap) and the reader are their own chunks: only a study route loads them.
const StudyEditorScreen = lazyScreen(() => import('../features/study-editor/components/study-editor-screen'), 'StudyEditorScreen');
const StudyReaderScreen = lazyScreen(() => import('../features/study-reader/components/study-reader-screen'), 'StudyReaderScreen');
const StudyRevisionsScreen = lazyScreen(() => import('../features/revisions/components/study-revisions-screen'), 'StudyRevisionsScreen');
const RevisionScreen = lazyScreen(() => import('../features/revisions/components/revision-screen'), 'RevisionScreen');
const CompareScreen = lazyScreen(() => import('../features/revisions/components/compare-screen'), 'CompareScreen');
const ReviewQueueScreen = lazyScreen(() => import('../features/revisions/components/review-queue-screen'), 'ReviewQueueScreen');
const DeliverablesScreen = lazyScreen(() => import('../features/deliverables/components/deliverables-screen'), 'DeliverablesScreen');
const VerifyScreen = lazyScreen(() => import('../features/verify/components/verify-screen'), 'VerifyScreen');

export const router = createBrowserRouter([
  {
    errorElement: <RouteErrorScreen />,
    children: [
      {
        element: <PublicLayout />,
        children: [
          { path: paths.signIn, element: <SignInScreen /> },
          { path: paths.forgotPassword, element: <ForgotPasswordScreen /> },
          { path: paths.resetPassword, element: <ResetPasswordScreen /> },
          { path: `${paths.resetPassword}/:token`, element: <ResetPasswordScreen /> },
          { path: '/invitations/:token', element: <AcceptInvitationScreen /> },
        ],
      },
      {
        element: (
          <RequireSession>
            <AppLayout />
          </RequireSession>
        ),
        children: [
          { index: true, element: <Navigate to={paths.engagements} replace /> },
          { path: paths.engagements, element: <EngagementsScreen /> },
          { path: '/engagements/:id', element: <EngagementOverviewScreen /> },
          {
            // Clients see released deliverables only; the API refuses them the register too.
            element: <RequireRole roles={['admin', 'partner', 'consultant']} />,
            children: [
              { path: '/engagements/:id/assumptions', element: <AssumptionsScreen /> },
              { path: '/engagements/:id/datasets', element: <DatasetsScreen /> },
              { path: '/datasets/:id', element: <DatasetScreen /> },
            ],
          },
          { path: '/studies/:id', element: <StudyEditorScreen /> },
          { path: '/studies/:id/read', element: <StudyReaderScreen /> },
          { path: paths.deliverables, element: <DeliverablesScreen /> },
          { path: paths.verify, element: <VerifyScreen /> },
          {
            // Revisions and their review belong to the firm; clients get the released PDF only.
            element: <RequireRole roles={['admin', 'partner', 'consultant']} />,
            children: [
              { path: '/studies/:id/revisions', element: <StudyRevisionsScreen /> },
              { path: '/revisions/:id', element: <RevisionScreen /> },
              { path: '/revisions/:id/compare/:other', element: <CompareScreen /> },
            ],
          },
          {
            element: <RequireRole roles={['partner']} />,
            children: [{ path: paths.reviews, element: <ReviewQueueScreen /> }],
          },
          {
            element: <RequireRole roles={['admin']} />,
            children: [
              { path: paths.adminUsers, element: <AdminUsersScreen /> },
              { path: paths.adminEngagements, element: <AdminEngagementsScreen /> },
              { path: paths.audit, element: <AuditScreen /> },
              { path: paths.mailbox, element: <MailboxScreen /> },
            ],
          },
          { path: '*', element: <NotFoundScreen /> },
        ],
      },
    ],
  },
]);
