// beamwarden-cli's argument parsing for the hazard verbs (nohd, od, eyewear): Arguments::parse with the hazard flags,
// hazardRequestFrom, and the evaluation of whatever request they accept. One argument per line of the input. The
// verbs themselves are left out: they print, and `sheet` needs Qt.
#include "arguments.hpp"
#include "fuzzsupport.hpp"
#include "hazardrequest.hpp"
#include "promises.hpp"

#include <string>
#include <vector>

namespace {

constexpr std::size_t kMostArguments = 64;

std::vector<std::string> splitArguments(std::string_view text)
{
    std::vector<std::string> args;
    while (!text.empty() && args.size() < kMostArguments) {
        const auto end = text.find('\n');
        args.emplace_back(text.substr(0, end));
        text = end == std::string_view::npos ? std::string_view{} : text.substr(end + 1);
    }
    return args;
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    using namespace beamwarden;
    const auto args = cli::Arguments::parse(splitArguments(fuzzsupport::text(data, size)), cli::hazardFlags());
    if (!args)
        return 0;
    const auto request = cli::hazardRequestFrom(*args);
    if (!request)
        return 0;
    const auto result = hazard::evaluateHazard(*request);
    if (result)
        fuzzsupport::require(fuzzpromise::hazardResult(*result));
    return 0;
}
