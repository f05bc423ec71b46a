// The eyewear part of the sheet's model: the item (or pair) worn or the best on the shelf, required OD per band
// against what it provides, the plot's curves, what a purchase needs, and every shelf item's verdict.
#include "sheetformat.hpp"
#include "sheetmodel.hpp"
#include "sheettr.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <map>
#include <optional>
#include <regex>
#include <tuple>
#include <utility>

namespace beamwarden::sheet {

namespace {

// The eyewear the plot and the band table show: the first item (or pair) that covers every output, else the item
// with the largest OD margin.
struct Chosen {
    std::vector<std::size_t> items;
    std::vector<std::vector<std::string>> outputsCovered;
    bool covers = false;
};

Chosen chooseEyewear(const SheetContent& content)
{
    const assessment::LaserAssessment& a = content.assessment;
    Chosen chosen;
    const eyewear::Selection& s = a.selection;
    const eyewear::Choice* choice = !s.singles.empty() ? &s.singles.front()
                                    : !s.pairs.empty() ? &s.pairs.front()
                                                       : nullptr;
    if (choice) {
        chosen.items = choice->items;
        chosen.outputsCovered = choice->outputsCovered;
        chosen.covers = true;
        return chosen;
    }
    // Nothing covers: show the item with OD data that covers the most outputs (then the fewest shortfalls).
    std::optional<std::size_t> best;
    std::tuple<int, int, double> bestScore{};
    for (std::size_t i = 0; i < a.eyewear.size() && i < content.shelf.size(); ++i) {
        const model::EyewearItem& item = content.shelf[i];
        if (item.spectralOd.empty() && item.en207Markings.empty() && item.en208Markings.empty())
            continue;
        const eyewear::ProtectionCheck& c = a.eyewear[i].check;
        int covered = 0;
        int notShort = 0;
        for (const eyewear::OutputCheck& o : c.outputs) {
            covered += o.verdict == eyewear::Verdict::Covers ? 1 : 0;
            notShort += o.verdict != eyewear::Verdict::FallsShort ? 1 : 0;
        }
        const std::tuple<int, int, double> score{covered, notShort, std::isfinite(c.marginOd) ? c.marginOd : -1e300};
        if (!best || score > bestScore) {
            best = i;
            bestScore = score;
        }
    }
    if (best)
        chosen.items = {*best};
    return chosen;
}

std::optional<eyewear::ParsedEyewear> parsedItem(const SheetContent& content, std::size_t index)
{
    if (index >= content.shelf.size())
        return std::nullopt;
    auto parsed = eyewear::parseEyewear(content.shelf[index]);
    if (!parsed)
        return std::nullopt;
    return std::move(*parsed);
}

// The lowest OD the item promises over [from, to] nm; nullopt where some wavelength is not rated.
std::optional<double> lowestProvided(const eyewear::ParsedEyewear& item, double from_nm, double to_nm)
{
    double lowest = std::numeric_limits<double>::infinity();
    const int steps = from_nm == to_nm ? 0 : 24;
    for (int i = 0; i <= steps; ++i) {
        const double lambda = steps == 0 ? from_nm : from_nm + (to_nm - from_nm) * i / steps;
        const eyewear::ProvidedOd p = eyewear::providedOd(item, lambda);
        if (!p.rated)
            return std::nullopt;
        lowest = std::min(lowest, p.od);
    }
    return lowest;
}

PlotCurve curveFor(const eyewear::ParsedEyewear& item, double from_nm, double to_nm)
{
    std::vector<double> lambdas;
    constexpr int kSamples = 480;
    for (int i = 0; i <= kSamples; ++i)
        lambdas.push_back(from_nm * std::pow(to_nm / from_nm, static_cast<double>(i) / kSamples));
    // The edges of every rated span, so steps sit where the item's data puts them.
    auto edge = [&](double nm) {
        for (const double x : {nm * (1.0 - 1e-9), nm, nm * (1.0 + 1e-9)}) {
            if (x > from_nm && x < to_nm)
                lambdas.push_back(x);
        }
    };
    for (const model::OdRow& row : item.item.spectralOd) {
        edge(row.from.nanometres());
        edge(row.to.nanometres());
    }
    for (const eyewear::En207Marking& marking : item.en207) {
        for (const eyewear::MarkingTerm& term : marking.terms) {
            for (const eyewear::WavelengthSpan& span : term.wavelengths) {
                edge(span.from_nm);
                edge(span.to_nm);
            }
        }
    }
    std::sort(lambdas.begin(), lambdas.end());
    PlotCurve curve;
    curve.label = fromUtf8(item.item.name);
    for (const double lambda : lambdas) {
        const eyewear::ProvidedOd p = eyewear::providedOd(item, lambda);
        curve.points.emplace_back(lambda, p.rated ? p.od : std::numeric_limits<double>::quiet_NaN());
    }
    return curve;
}

QString firstReason(const eyewear::ProtectionCheck& check, const SheetFormat& f)
{
    for (const eyewear::OutputCheck& o : check.outputs) {
        if (o.verdict == check.verdict && !o.reasons.empty())
            return fromUtf8(o.reasons.front());
    }
    if (check.verdict == eyewear::Verdict::Covers && std::isfinite(check.marginOd))
        return Sheet::tr("OD margin %1").arg(QStringLiteral("+") + f.number(check.marginOd, 1));
    return {};
}

// What a purchase must be marked with, one line per output where its cases ask for the same kind of marking: a
// filter marked with the highest level of each term meets every case of the output. Lines come from core as
// "output (case): marking, OD >= x"; anything that does not read that way is printed as it came.
QStringList purchaseLines(const std::vector<std::string>& lines)
{
    struct Line {
        std::string output;
        std::string cases;
        std::string marking;
        std::optional<eyewear::En207Marking> parsed;
        bool merged = false;
    };
    static const std::regex shape(R"(^(.*) \(([^()]*)\): (.*?)(, OD >= [0-9.]+)?$)");
    std::vector<Line> parsed;
    QStringList out;
    for (const std::string& text : lines) {
        std::smatch match;
        if (!std::regex_match(text, match, shape)) {
            out.push_back(fromUtf8(text));
            continue;
        }
        Line line{match[1].str(), match[2].str(), match[3].str(), std::nullopt, false};
        if (auto marking = eyewear::parseEn207(line.marking))
            line.parsed = *marking;
        // Merge with an earlier line of the same output when both markings have the same terms.
        auto same = std::find_if(parsed.begin(), parsed.end(), [&](const Line& earlier) {
            if (earlier.output != line.output || !earlier.parsed || !line.parsed ||
                earlier.parsed->terms.size() != line.parsed->terms.size())
                return false;
            for (std::size_t t = 0; t < line.parsed->terms.size(); ++t) {
                const eyewear::MarkingTerm& a = earlier.parsed->terms[t];
                const eyewear::MarkingTerm& b = line.parsed->terms[t];
                if (a.wavelengths != b.wavelengths || a.modes != b.modes)
                    return false;
            }
            return true;
        });
        if (same == parsed.end()) {
            parsed.push_back(std::move(line));
            continue;
        }
        for (std::size_t t = 0; t < line.parsed->terms.size(); ++t) {
            eyewear::MarkingTerm& a = same->parsed->terms[t];
            const eyewear::MarkingTerm& b = line.parsed->terms[t];
            a.level = std::max(a.level, b.level);
            a.notTestedAtLowRates = a.notTestedAtLowRates && b.notTestedAtLowRates;
        }
        same->marking = eyewear::format(*same->parsed);
        same->merged = true;
    }
    // A merged line holds for every case of its output, so the cases need not be named.
    for (const Line& line : parsed)
        out.push_back(fromUtf8(line.merged ? line.output + ": " + line.marking
                                           : line.output + " (" + line.cases + "): " + line.marking));
    return out;
}

} // namespace

void addEyewearModel(SheetModel& m, const SheetContent& content, const SheetFormat& f)
{
    const assessment::LaserAssessment& a = content.assessment;
    const Chosen chosen = chooseEyewear(content);

    std::vector<std::optional<eyewear::ParsedEyewear>> chosenItems;
    QStringList chosenNames;
    for (const std::size_t i : chosen.items) {
        chosenItems.push_back(parsedItem(content, i));
        if (i < a.eyewear.size())
            chosenNames.push_back(fromUtf8(a.eyewear[i].itemName));
    }

    // Bands merged over outputs and cases: the highest requirement of each, with the outputs it comes from.
    struct Merged {
        double from_nm = 0;
        double to_nm = 0;
        double od = 0;
        bool reconstructed = false;
        std::vector<std::string> outputs;
    };
    std::map<std::pair<long long, long long>, Merged> merged;
    for (const assessment::OutputAssessment& o : a.outputs) {
        for (const assessment::CaseAssessment& c : o.cases) {
            for (const hazard::BandOd& band : c.eye.bands) {
                const double from = band.from.nanometres();
                const double to = band.to.nanometres();
                const auto key = std::make_pair(std::llround(from * 100.0), std::llround(to * 100.0));
                Merged& entry = merged[key];
                entry.from_nm = from;
                entry.to_nm = to;
                entry.od = std::max(entry.od, hazard::roundOdUp(band.requiredOd));
                entry.reconstructed = entry.reconstructed || anyLineReconstructed(c.eye, from, to);
                if (std::find(entry.outputs.begin(), entry.outputs.end(), o.name) == entry.outputs.end())
                    entry.outputs.push_back(o.name);
            }
        }
    }

    m.providedHeader = chosenNames.isEmpty() ? Sheet::tr("Eyewear OD")
                                             : Sheet::tr("OD of %1").arg(chosenNames.join(QStringLiteral(" / ")));
    for (const auto& [key, entry] : merged) {
        BandRow row;
        row.from_nm = entry.from_nm;
        row.to_nm = entry.to_nm;
        row.requiredOd = entry.od;
        row.band = entry.from_nm == entry.to_nm ? f.quantity(units::Wavelength::fromSi(entry.from_nm * 1e-9))
                                                : Sheet::tr("%1 to %2")
                                                      .arg(f.quantity(units::Wavelength::fromSi(entry.from_nm * 1e-9)),
                                                           f.quantity(units::Wavelength::fromSi(entry.to_nm * 1e-9)));
        QStringList outputs;
        for (const std::string& name : entry.outputs)
            outputs.push_back(fromUtf8(name));
        row.outputs = outputs.join(QStringLiteral(", "));
        row.required = {entry.od > 0.0 ? f.number(entry.od, 1) : Sheet::tr("none"), entry.reconstructed};

        // With a pair, the band is judged against the item worn for its output.
        std::size_t which = 0;
        for (std::size_t k = 0; k < chosen.outputsCovered.size() && k < chosenItems.size(); ++k) {
            const auto& covered = chosen.outputsCovered[k];
            if (std::any_of(entry.outputs.begin(), entry.outputs.end(), [&](const std::string& name) {
                    return std::find(covered.begin(), covered.end(), name) != covered.end();
                })) {
                which = k;
                break;
            }
        }
        if (which < chosenItems.size() && chosenItems[which]) {
            const std::optional<double> provided = lowestProvided(*chosenItems[which], entry.from_nm, entry.to_nm);
            if (!provided) {
                row.provided = Sheet::tr("not rated here");
                row.providedShort = true;
            } else if (*provided + 1e-9 >= entry.od) {
                row.provided = Sheet::tr("%1, enough").arg(f.number(*provided, 1));
            } else {
                row.provided =
                    Sheet::tr("%1, short by %2").arg(f.number(*provided, 1), f.number(entry.od - *provided, 1));
                row.providedShort = true;
            }
            if (chosenItems.size() > 1 && which < static_cast<std::size_t>(chosenNames.size()))
                row.provided = chosenNames[static_cast<qsizetype>(which)] + QStringLiteral(": ") + row.provided;
        } else {
            row.provided = QStringLiteral("\u2014");
        }
        m.bands.push_back(row);
        m.plot.required.push_back(PlotBand{entry.from_nm, entry.to_nm, entry.od});
    }

    // Plot range: every band with some room either side, within the range any rule covers.
    double lo = std::numeric_limits<double>::infinity();
    double hi = 0.0;
    for (const BandRow& b : m.bands) {
        lo = std::min(lo, b.from_nm);
        hi = std::max(hi, b.to_nm);
    }
    if (!(hi > 0.0)) {
        lo = 400.0;
        hi = 700.0;
    }
    m.plot.from_nm = std::max(180.0, lo / 1.6);
    m.plot.to_nm = std::min(1e6, hi * 1.6);
    for (const auto& item : chosenItems) {
        if (item)
            m.plot.eyewear.push_back(curveFor(*item, m.plot.from_nm, m.plot.to_nm));
    }
    if (!chosen.covers && !chosen.items.empty())
        m.plot.eyewearNote = Sheet::tr("best on the shelf; it does not cover every output");

    // The verdict in a sentence, then every shelf item with its verdict and first reason.
    const eyewear::Selection& s = a.selection;
    auto itemName = [&](std::size_t i) { return i < a.eyewear.size() ? fromUtf8(a.eyewear[i].itemName) : QString(); };
    auto outputsText = [](const std::vector<std::string>& names) {
        QStringList list;
        for (const std::string& n : names)
            list.push_back(fromUtf8(n));
        return list.join(QStringLiteral(", "));
    };
    if (a.eyewear.empty()) {
        m.eyewearSummary = Sheet::tr("No eyewear on the shelf: nothing has been checked against this laser.");
    } else if (!s.singles.empty()) {
        m.eyewearSummary = Sheet::tr("Wear %1: it covers every output.").arg(itemName(s.singles.front().items.front()));
        QStringList others;
        for (std::size_t i = 1; i < s.singles.size(); ++i)
            others.push_back(itemName(s.singles[i].items.front()));
        if (!others.isEmpty())
            m.eyewearSummary +=
                QLatin1Char(' ') + Sheet::tr("Also covering: %1.").arg(others.join(QStringLiteral(", ")));
    } else if (!s.pairs.empty() && s.pairs.front().items.size() == 2) {
        const eyewear::Choice& pair = s.pairs.front();
        m.eyewearSummary = Sheet::tr("No single item covers every output. Wear %1 for %2, and %3 for %4.")
                               .arg(itemName(pair.items[0]), outputsText(pair.outputsCovered[0]),
                                    itemName(pair.items[1]), outputsText(pair.outputsCovered[1]));
    } else {
        m.eyewearSummary = Sheet::tr("Nothing on the shelf covers every output.");
    }
    if (s.singles.empty() && s.pairs.empty()) {
        m.purchaseMarkings = purchaseLines(s.purchaseMarkings);
    }
    // Items that fall short (or cannot be told) for the same first reason share a row, so a long shelf of goggles
    // for other wavelengths reads as one line.
    for (std::size_t i = 0; i < a.eyewear.size(); ++i) {
        ShelfRow row;
        row.name = itemName(i);
        row.verdict = a.eyewear[i].check.verdict;
        row.verdictText = SheetFormat::verdict(row.verdict);
        row.reason = firstReason(a.eyewear[i].check, f);
        row.chosen = std::find(chosen.items.begin(), chosen.items.end(), i) != chosen.items.end();
        const auto same = std::find_if(m.shelf.begin(), m.shelf.end(), [&](const ShelfRow& r) {
            return !r.chosen && !row.chosen && r.verdict != eyewear::Verdict::Covers && r.verdict == row.verdict &&
                   r.reason == row.reason;
        });
        if (same != m.shelf.end())
            same->name += QStringLiteral(", ") + row.name;
        else
            m.shelf.push_back(row);
    }
    // What is worn first, then what covers, then the rest from "cannot tell" to "falls short".
    std::stable_sort(m.shelf.begin(), m.shelf.end(), [](const ShelfRow& x, const ShelfRow& y) {
        return std::make_pair(!x.chosen, x.verdict) < std::make_pair(!y.chosen, y.verdict);
    });
}

} // namespace beamwarden::sheet
