/** The DejaVu TrueType files the PDF report embeds: regular, bold and mono. */
export const BUNDLED_FONT_FILES = ['DejaVuSans.ttf', 'DejaVuSans-Bold.ttf', 'DejaVuSansMono.ttf'] as const;
