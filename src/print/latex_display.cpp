#include "print/latex_display.hpp"

#include "print/latex_width.hpp"

namespace couplet {

namespace {

using print_detail::latex_width;

double width_of(const std::vector<latex_piece>& side) {
    double w = 0;
    for (const latex_piece& p : side) w += latex_width(p.text) + 0.3;
    return w;
}

std::string joined(const std::vector<latex_piece>& side) {
    std::string out;
    for (const latex_piece& p : side) out += (out.empty() ? "" : " ") + p.text;
    return out;
}

// The lines of one side, the first one opened with `opening` (a relation, or nothing).
void flow(const std::vector<latex_piece>& side, const std::string& opening, double width,
          std::vector<std::string>& lines) {
    const std::string indent = "\\qquad";
    std::string line = opening;
    double used = latex_width(opening);
    bool line_has_piece = false;
    int depth = 0;  // \left( opened on earlier lines and not yet closed
    for (const latex_piece& p : side) {
        const double w = latex_width(p.text);
        if (line_has_piece && used + w > width) {
            for (int k = 0; k < depth; ++k) line += " \\right.";
            lines.push_back(line);
            line = indent;
            for (int k = 0; k < depth; ++k) line += " \\left.";
            used = latex_width(indent);
            line_has_piece = false;
        }
        depth += p.opens;
        std::string text = p.text;
        if (!line_has_piece && line.compare(0, indent.size(), indent) == 0) {
            // A new line inside a product says so; a term's sign needs {} to stay a binary sign.
            if (!p.starts_term)
                text = "\\times " + text, used += 1.3;
            else if (text[0] == '+' || text[0] == '-')
                text = "{}" + text;
        }
        line += (line_has_piece || !opening.empty() || line != "" ? " " : "") + text;
        used += w + 0.3;
        line_has_piece = true;
        depth -= p.closes;
    }
    lines.push_back(line);
}

}  // namespace

std::string layout_display(const display_formula& f, display_style style, double width_em) {
    double total = 0;
    for (const std::string& n : f.notes) total += latex_width(n);
    for (const auto& side : f.sides) total += width_of(side);
    for (const auto& r : f.relations) total += latex_width(r) + 0.6;
    const std::string tag = f.tag.empty() ? "" : " \\tag*{\\footnotesize " + latex_escaped_text(f.tag) + "}";

    if (total <= width_em) {
        std::string one;
        for (std::size_t k = 0; k < f.sides.size(); ++k) {
            if (k) one += " " + f.relations[k - 1] + " ";
            one += joined(f.sides[k]);
        }
        for (const std::string& n : f.notes) one += n;
        if (style == display_style::fragment) return one + "\n";
        return "\\begin{equation*}\n" + one + tag + "\n\\end{equation*}\n";
    }
    std::vector<std::string> lines;
    for (std::size_t k = 0; k < f.sides.size(); ++k) {
        std::string opening = k ? f.relations[k - 1] : "";
        // A short left side (a name) keeps its relation on its line: R = ..., not R alone.
        if (k == 1 && lines.size() == 1 && width_of(f.sides[0]) <= 4.0) {
            opening = lines.back() + " " + opening;
            lines.pop_back();
        }
        flow(f.sides[k], opening, width_em, lines);
    }
    for (const std::string& n : f.notes) {
        if (latex_width(lines.back()) + latex_width(n) <= width_em)
            lines.back() += n;
        else
            lines.push_back(n);
    }
    const bool document = style == display_style::document;
    std::string out = document ? "\\begin{align*}\n" : "\\begin{aligned}\n";
    for (std::size_t k = 0; k < lines.size(); ++k) {
        out += "&" + lines[k];
        if (k + 1 < lines.size()) out += " \\\\\n";
    }
    if (document) out += tag;
    out += document ? "\n\\end{align*}\n" : "\n\\end{aligned}\n";
    return out;
}

std::string latex_escaped_text(const std::string& s) {
    std::string out;
    for (char c : s) {
        const unsigned char u = static_cast<unsigned char>(c);
        switch (c) {
            case '\\':
                out += "\\textbackslash{}";
                break;
            case '{':
                out += "\\{";
                break;
            case '}':
                out += "\\}";
                break;
            case '$':
                out += "\\$";
                break;
            case '&':
                out += "\\&";
                break;
            case '#':
                out += "\\#";
                break;
            case '%':
                out += "\\%";
                break;
            case '_':
                out += "\\_";
                break;
            case '^':
                out += "\\^{}";
                break;
            case '~':
                out += "\\~{}";
                break;
            case '<':
                out += "\\textless{}";
                break;
            case '>':
                out += "\\textgreater{}";
                break;
            case '|':
                out += "\\textbar{}";
                break;
            default:
                if (u >= 0x20 && u < 0x7f)
                    out += c;
                else if (u >= 0xc0)
                    out += '?';  // one mark per non-ASCII character: only ASCII is safe for every TeX
        }
    }
    return out;
}

}  // namespace couplet
