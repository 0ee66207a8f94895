#include "pinproof/report/report_style.hpp"

#include <cstdio>

namespace pinproof {

// A CSS string literal of a user's text (CSS Syntax Level 3, 4.3.5): quotes,
// backslashes, angle brackets and control characters as hexadecimal escapes,
// so that no text can end the string or the style element.
std::string css_string(const std::string& text)
{
    std::string out = "\"";
    char buf[16];
    for (unsigned char c : text) {
        if (c < 0x20 || c == 0x7f || c == '"' || c == '\\' || c == '<' || c == '>' || c == '&') {
            std::snprintf(buf, sizeof buf, "\\%x ", static_cast<unsigned>(c < 0x20 || c == 0x7f ? 0x20 : c));
            out += buf;
        } else {
            out += static_cast<char>(c);
        }
    }
    return out + "\"";
}

std::string page_margin_boxes(unit_system units, const std::string& top_left, const std::string& top_right,
                              const std::string& bottom_left)
{
    const std::string box = "font-family: 'DejaVu Sans', Arial, sans-serif; font-size: 8pt; color: #333;";
    std::string css = std::string("@page { size: ") + (units == unit_system::us_customary ? "letter" : "A4") +
                      "; margin: 16mm 18mm 16mm 18mm;\n";
    css += "  @top-left { content: " + css_string(top_left) + "; " + box + " vertical-align: bottom; }\n";
    if (!top_right.empty())
        css += "  @top-right { content: " + css_string(top_right) + "; " + box + " vertical-align: bottom; }\n";
    css += "  @bottom-left { content: " + css_string(bottom_left) + "; " + box + " vertical-align: top; }\n";
    css += "  @bottom-right { content: \"Sheet \" counter(page) \" of \" counter(pages); " + box +
           " vertical-align: top; }\n}\n";
    return css;
}

std::string report_stylesheet()
{
    return
          "html { font-family: 'DejaVu Sans', 'Liberation Sans', Arial, sans-serif; font-size: 10pt; color: #111; }\n"
          "body { margin: 0 auto; max-width: 174mm; padding: 4mm 0; line-height: 1.35; }\n"
          "h1 { font-size: 17pt; margin: 0 0 3mm 0; }\n"
          "h2 { font-size: 13.5pt; margin: 6mm 0 2mm 0; border-bottom: 1.5px solid #333; }\n"
          "h3 { font-size: 11.5pt; margin: 5mm 0 2mm 0; }\n"
          "h4 { font-size: 10.5pt; margin: 4mm 0 1.5mm 0; }\n"
          "p, li { margin: 1.2mm 0; }\n"
          "table { border-collapse: collapse; width: 100%; margin: 2mm 0 3mm 0; table-layout: auto; }\n"
          "th, td { border: 1px solid #999; padding: 1mm 1.6mm; text-align: left; vertical-align: top; "
          "overflow-wrap: break-word; }\n"
          "th { background: #eceff3; }\n"
          "td.num { text-align: right; white-space: nowrap; }\n"
          "td.id { white-space: nowrap; }\n"
          "table.kv th { width: 32%; }\n"
          "code, .hash { font-family: 'DejaVu Sans Mono', monospace; font-size: 8.5pt; overflow-wrap: break-word; }\n"
          "figure.chart { margin: 3mm 0 4mm 0; break-inside: avoid; page-break-inside: avoid; }\n"
          "figure.chart svg { display: block; width: 100%; height: auto; max-width: 100%; }\n"
          "figcaption { font-size: 9pt; color: #333; margin-top: 1mm; }\n"
          "section.beam { break-before: page; page-break-before: always; }\n"
          // A printed calc sheet: headings stay with what follows them, no row or
          // figure is split, table headers repeat on each page.
          "h1, h2, h3, h4 { break-after: avoid-page; page-break-after: avoid; }\n"
          "tr, figure, .verdict, .caution { break-inside: avoid; page-break-inside: avoid; }\n"
          "thead { display: table-header-group; }\n"
          "table.checks td { font-size: 9pt; }\n"
          "table.checks tbody.check { break-inside: avoid; page-break-inside: avoid; }\n"
          "table.checks td.status { width: 12mm; }\n"
          "table.checks td.check-id { font-family: 'DejaVu Sans Mono', monospace; font-size: 8.5pt; white-space: nowrap; "
          "border-bottom: none; }\n"
          "table.checks td.value { text-align: right; width: 45%; border-bottom: none; }\n"
          "table.checks td.reason { border-top: none; color: #222; }\n"
          ".nw { white-space: nowrap; }\n"
          ".status { font-weight: bold; white-space: nowrap; }\n"
          ".status.fail { color: #b00000; }\n"
          ".status.pass { color: #1b6e20; }\n"
          ".status.warn { color: #8a5a00; }\n"
          ".status.na { color: #555; }\n"
          ".verdict { border: 2px solid #333; padding: 2mm 3mm; margin: 3mm 0; font-weight: bold; "
          "break-inside: avoid; }\n"
          ".verdict.fail { border-color: #b00000; color: #b00000; }\n"
          ".verdict.pass { border-color: #1b6e20; color: #1b6e20; }\n"
          ".caution { border: 1px solid #8a5a00; background: #fff8e6; padding: 2mm 3mm; margin: 3mm 0; }\n"
          ".note { font-size: 9pt; color: #333; }\n"
          "p.inputs { font-size: 9pt; margin-bottom: 0.5mm; }\n"
          "ul.defaults { margin: 0 0 2mm 0; padding-left: 5mm; list-style: none; }\n"
          "@media print { body { padding: 0; } a { color: inherit; text-decoration: none; }\n"
          // A calc sheet's type: 9 pt text, 8.5 pt tables, tight cells; the
          // reasons of checks that pass or do not apply in 7.5 pt (a failure
          // or a warning keeps 9 pt: it is what the checker reads first).
          "  html { font-size: 9pt; }\n"
          "  th, td { padding: 0.5mm 1.2mm; font-size: 8.5pt; }\n"
          "  h2 { margin: 4mm 0 1.5mm 0; } h3 { margin: 3.5mm 0 1.5mm 0; } h4 { margin: 3mm 0 1mm 0; }\n"
          "  table { margin: 1.5mm 0 2mm 0; }\n"
          "  table.checks td { font-size: 8pt; }\n"
          "  ul.defaults li { margin: 0.3mm 0; }\n"
          "  table.checks tbody.pass td.reason, table.checks tbody.na td.reason { font-size: 7.5pt; color: #333; }\n"
          // On paper a chart needs less height than on a screen: the drawing
          // keeps its proportions inside the box (the viewBox scales it).
          "  figure.chart svg { max-height: 60mm; }\n"
          "  figure.chart[data-chart=sweep] svg { max-height: 85mm; }\n"
          "  figure.chart[data-chart=gap-detail] svg { max-height: 100mm; }\n"
          "  figcaption { font-size: 8pt; }\n"
          // A heading, its text and its chart move to the next sheet together.
          "  div.keep { break-inside: avoid; page-break-inside: avoid; }\n}\n";
}

}  // namespace pinproof
