import OpenInNew from '@mui/icons-material/OpenInNew';
import { Box, Divider, ListItemIcon, ListItemText, ListSubheader, MenuItem } from '@mui/material';
import type { MouseEvent, ReactElement } from 'react';
import { Menu as RaMenu, usePermissions, useSidebarState } from 'react-admin';
import { menuIcons } from './icons';
import { menuFor } from './menuModel';
import { openQueueDashboard } from './queueDashboard';

/** The side menu: only the entries the person's role allows, grouped under quiet headings. */
export function Menu() {
  const { permissions, isPending } = usePermissions<string[]>();
  const [open] = useSidebarState();
  if (isPending) return <RaMenu aria-label="Main menu">{[]}</RaMenu>;
  const sections = menuFor(permissions);
  // MUI's MenuList wants its items as direct children: build one flat list
  const items: ReactElement[] = [];
  sections.forEach((section, i) => {
    if (i > 0 && !open) items.push(<Divider key={`${section.id}-divider`} sx={{ my: 0.5 }} />);
    if (open) {
      items.push(
        // a labelled separator: the one non-item a menu may hold, and skipped by arrow keys
        <ListSubheader
          key={`${section.id}-heading`}
          role="separator"
          aria-label={section.label}
          disableSticky
          sx={{
            bgcolor: 'transparent',
            lineHeight: 1.6,
            px: 2,
            pt: i === 0 ? 0.5 : 1.75,
            pb: 0.25,
            color: 'text.secondary',
            fontSize: '0.68rem',
            fontWeight: 500,
            letterSpacing: '0.09em',
            textTransform: 'uppercase',
          }}
        >
          {section.label}
        </ListSubheader>,
      );
    }
    for (const link of section.links) {
      const Icon = menuIcons[link.id];
      const icon = Icon ? <Icon /> : undefined;
      if (link.external) {
        items.push(
          <MenuItem
            key={link.id}
            component="a"
            href={link.to}
            target="_blank"
            rel="noopener"
            onClick={
              link.pass
                ? (e: MouseEvent) => {
                    e.preventDefault();
                    void openQueueDashboard(link.pass!);
                  }
                : undefined
            }
            title={open ? undefined : link.label}
            data-menu-entry={link.id}
            sx={{ color: 'text.secondary' }}
          >
            {icon ? <ListItemIcon sx={{ minWidth: 40 }}>{icon}</ListItemIcon> : null}
            {open ? (
              <ListItemText primary={link.label} slotProps={{ primary: { fontSize: '0.9rem' } }} />
            ) : (
              <Box component="span" sx={visuallyHidden}>
                {link.label}
              </Box>
            )}
            {open ? <OpenInNew sx={{ fontSize: 14, ml: 1, opacity: 0.7 }} aria-label="opens in a new tab" /> : null}
          </MenuItem>,
        );
      } else {
        items.push(<RaMenu.Item key={link.id} to={link.to} primaryText={link.label} leftIcon={icon} data-menu-entry={link.id} />);
      }
    }
  });
  return (
    <RaMenu aria-label="Main menu" sx={{ pt: 1 }}>
      {items}
    </RaMenu>
  );
}

const visuallyHidden = {
  position: 'absolute',
  width: 1,
  height: 1,
  overflow: 'hidden',
  clip: 'rect(0 0 0 0)',
  whiteSpace: 'nowrap',
} as const;
