using MudBlazor;

namespace Decide.Web.Components.Layout;

/// <summary>
/// Decide's look: deep lake blue on warm paper, sage and ochre as accents, system fonts (nothing is fetched from
/// another host). Text colours keep a contrast of at least 4.5:1 on the page and the cards.
/// </summary>
public static class DecideTheme
{
    public static MudTheme Theme { get; } = new()
    {
        PaletteLight = new PaletteLight
        {
            Primary = "#1F5A6E",
            PrimaryContrastText = "#FFFFFF",
            Secondary = "#4F6B43",
            SecondaryContrastText = "#FFFFFF",
            Tertiary = "#8C5412",
            TertiaryContrastText = "#FFFFFF",
            Info = "#1D5C92",
            Success = "#2C6636",
            Warning = "#7F5200",
            Error = "#A3262C",
            Dark = "#27343A",
            AppbarBackground = "#17394A",
            AppbarText = "#FFFFFF",
            Background = "#F5F3EE",
            BackgroundGray = "#ECE9E1",
            Surface = "#FFFFFF",
            TextPrimary = "#1C2A30",
            TextSecondary = "#46565E",
            ActionDefault = "#46565E",
            LinesDefault = "#D5D1C6",
            LinesInputs = "#8A948F",
            TableLines = "#E2DED4",
            TableStriped = "#FAF9F6",
            Divider = "#D5D1C6",
            DrawerBackground = "#FFFFFF",
            DrawerText = "#1C2A30",
        },
        Typography = new Typography
        {
            Default = new DefaultTypography
            {
                FontFamily = ["system-ui", "\"Segoe UI\"", "\"DejaVu Sans\"", "\"Helvetica Neue\"", "Arial", "sans-serif"],
                FontSize = "0.95rem",
                LineHeight = "1.5",
            },
            H1 = new H1Typography { FontSize = "1.9rem", FontWeight = "600", LineHeight = "1.25", LetterSpacing = "0" },
            H2 = new H2Typography { FontSize = "1.35rem", FontWeight = "600", LineHeight = "1.3", LetterSpacing = "0" },
            H3 = new H3Typography { FontSize = "1.1rem", FontWeight = "600", LineHeight = "1.35", LetterSpacing = "0" },
            Button = new ButtonTypography { TextTransform = "none", FontWeight = "600", LetterSpacing = "0" },
        },
        LayoutProperties = new LayoutProperties { DefaultBorderRadius = "6px", AppbarHeight = "60px" },
    };
}
