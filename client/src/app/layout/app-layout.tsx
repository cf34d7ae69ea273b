import { AppShell, Container, Stack } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { Suspense } from 'react';
import { Outlet, useLocation } from 'react-router-dom';
import { CautionBanner } from '../../components/caution-banner';
import { PageLoader } from '../../components/page-loader';
import { RegionErrorBoundary } from '../../components/region-error-boundary';
import { AppHeader } from './app-header';
import { AppNavbar } from './app-navbar';
import classes from './app-layout.module.css';

/** The signed-in frame: header, navbar, the standing caution, and the current page. */
export function AppLayout() {
  const [navbarOpen, navbar] = useDisclosure(false);
  const { pathname } = useLocation();

  return (
    <AppShell
      header={{ height: 56 }}
      navbar={{ width: 232, breakpoint: 'sm', collapsed: { mobile: !navbarOpen } }}
      padding="md"
    >
      <a href="#main-content" className={classes.skipLink}>
        Skip to the main content
      </a>
      <AppShell.Header>
        <AppHeader navbarOpen={navbarOpen} onToggleNavbar={navbar.toggle} />
      </AppShell.Header>
      <AppShell.Navbar>
        <RegionErrorBoundary region="the navigation">
          <AppNavbar onNavigate={navbar.close} />
        </RegionErrorBoundary>
      </AppShell.Navbar>
      <AppShell.Main id="main-content" tabIndex={-1}>
        <Container size="xl" px={0}>
          <Stack gap="lg">
            <CautionBanner />
            <RegionErrorBoundary key={pathname} region="this page">
              <Suspense fallback={<PageLoader />}>
                <Outlet />
              </Suspense>
            </RegionErrorBoundary>
          </Stack>
        </Container>
      </AppShell.Main>
    </AppShell>
  );
}
