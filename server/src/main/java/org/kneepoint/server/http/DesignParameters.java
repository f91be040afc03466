package org.kneepoint.server.http;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.kneepoint.server.http.ApiRoute.ApiParameter;

/** The query parameters of the design routes, as the OpenAPI document describes them. */
final class DesignParameters {

    private static final Map<String, String[]> LENGTHS = Map.of(
            "diameter", new String[] {"outer diameter of a cylinder or ring", "10mm"},
            "length", new String[] {"cylinder or ring length along the magnetization", "5mm"},
            "innerDiameter", new String[] {"bore of a ring", "4mm"},
            "width", new String[] {"block edge along x", "20mm"},
            "depth", new String[] {"block edge along y", "10mm"},
            "thickness", new String[] {"block edge along the magnetization", "5mm"});

    private DesignParameters() {
    }

    static ApiParameter[] check() {
        List<ApiParameter> all = new ArrayList<>();
        all.add(ApiParameter.query("grade", false, "a grade of the library; without it, type one in with br, muRec, hcj", "DEMO NdFeB 42/100"));
        all.add(ApiParameter.query("br", false, "typed-in remanence Br at the reference temperature", "1.3T"));
        all.add(ApiParameter.query("muRec", false, "typed-in relative recoil permeability", "1.05"));
        all.add(ApiParameter.query("hcj", false, "typed-in intrinsic coercivity HcJ", "1600kA/m"));
        all.add(ApiParameter.query("knee", false, "typed-in knee field Hk (J = 0.9·Br); default a square knee 2 % of HcJ wide", "1450kA/m"));
        all.add(ApiParameter.query("alpha", false, "typed-in temperature coefficient of Br", "-0.12%/K"));
        all.add(ApiParameter.query("beta", false, "typed-in temperature coefficient of HcJ", "-0.6%/K"));
        all.add(ApiParameter.query("referenceTemperature", false, "temperature the typed-in values refer to (default 20C)", "20C"));
        loadLine(all);
        all.add(ApiParameter.query("lossLimit", false, "irreversible loss allowed at the minimum and maximum working temperatures (default 1%)", "1%"));
        return all.toArray(ApiParameter[]::new);
    }

    /** The check's parameters and those of its tolerance study. */
    static ApiParameter[] checkWithTolerances() {
        List<ApiParameter> all = new ArrayList<>(List.of(check()));
        all.add(ApiParameter.query("tolerance", false, "a tolerance band NAME=SPEC for a study of the check, repeatable (NAME br, hcj,"
                + " mu-rec, knee, pc, a size of the shape, temperature, opposing-field or external-field; SPEC ±2%, ±0.05mm, ±5K,"
                + " -5%..+0%); a band is a 3σ process limit", "br=±2%"));
        all.add(ApiParameter.query("distribution", false, "normal (default: 3σ = the band, truncated) or uniform", "normal"));
        all.add(ApiParameter.query("samples", false, "samples of the tolerance study (default 10000)", "10000"));
        all.add(ApiParameter.query("seed", false, "seed of the study's random numbers (default 14)", "14"));
        return all.toArray(ApiParameter[]::new);
    }

    static ApiParameter[] sweep() {
        List<ApiParameter> all = new ArrayList<>();
        for (ApiParameter parameter : check()) {
            if (!parameter.name().equals("temperature")) {
                all.add(parameter);
            }
        }
        all.add(ApiParameter.query("from", true, "first temperature", "20C"));
        all.add(ApiParameter.query("to", true, "last temperature (always included)", "180C"));
        all.add(ApiParameter.query("step", true, "step between temperatures, in kelvin", "5K"));
        return all.toArray(ApiParameter[]::new);
    }

    static ApiParameter[] duty() {
        List<ApiParameter> all = new ArrayList<>();
        for (ApiParameter parameter : check()) {
            if (!parameter.name().equals("temperature") && !parameter.name().equals("opposingField")
                    && !parameter.name().equals("externalField") && !parameter.name().equals("lossLimit")) {
                all.add(parameter);
            }
        }
        all.add(ApiParameter.query("steps", true, "the steps TEMPERATURE:FIELD[:external] separated by commas; a field is in the circuit"
                + " convention unless marked external", "20C:0, 150C:300kA/m, 120C:200kA/m:external"));
        all.add(ApiParameter.query("lossLimit", false, "irreversible loss allowed after the sequence, for its verdict (default 1%)", "1%"));
        return all.toArray(ApiParameter[]::new);
    }

    static ApiParameter[] select() {
        List<ApiParameter> all = new ArrayList<>();
        loadLine(all);
        all.add(ApiParameter.query("minFluxDensity", false, "least flux density B at the operating point (default none)", "1T"));
        all.add(ApiParameter.query("maxLoss", false, "largest irreversible loss allowed (default 1%)", "1%"));
        all.add(ApiParameter.query("family", false, "only grades of this family", "sintered NdFeB"));
        all.add(ApiParameter.query("sort", false, "flux (default), margin, loss, temperature or price", "flux"));
        return all.toArray(ApiParameter[]::new);
    }

    static ApiParameter[] field(String... lengths) {
        List<ApiParameter> all = new ArrayList<>();
        for (String name : lengths) {
            all.add(ApiParameter.query(name, true, LENGTHS.get(name)[0], LENGTHS.get(name)[1]));
        }
        all.add(ApiParameter.query("br", true, "remanence Br = μ0·M of the magnet", "1.3T"));
        all.add(ApiParameter.query("at", true, "the point x,y,z (origin at the centre, M along +z); a unit after the last number applies to all",
                "2,0,3mm"));
        return all.toArray(ApiParameter[]::new);
    }

    private static void loadLine(List<ApiParameter> all) {
        all.add(ApiParameter.query("pc", false, "permeance coefficient of the load line; or give a shape", "2.5"));
        for (String name : List.of("diameter", "length", "innerDiameter", "width", "depth", "thickness")) {
            all.add(ApiParameter.query(name, false, LENGTHS.get(name)[0], LENGTHS.get(name)[1]));
        }
        all.add(ApiParameter.query("onSteel", false, "true: one pole face on a large steel plate", "false"));
        all.add(ApiParameter.query("factor", false, "demagnetizing factor: magnetometric (default), fluxmetric or center", "magnetometric"));
        all.add(ApiParameter.query("temperature", true, "temperature of the magnet", "120C"));
        all.add(ApiParameter.query("opposingField", false, "field against the magnetization in the circuit convention,"
                + " B = −μ0·Pc·(H + Ha) (default 0)", "200kA/m"));
        all.add(ApiParameter.query("externalField", false, "uniform external field against the magnetization on a free magnet,"
                + " H = −Hext − N·M with N = 1/(1 + Pc); not with opposingField", "300kA/m"));
    }
}
