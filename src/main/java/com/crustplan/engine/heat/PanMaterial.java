package com.crustplan.engine.heat;

import com.crustplan.engine.model.Parameter;

/**
 * What a pan or griddle is made of: its specific heat sets how far a load pulls it down;
 * its emissivity how much it radiates away. Properties near 300 K.
 */
public enum PanMaterial {

	CAST_IRON("cast iron", Parameter.fromMemory("cp,ci", "specific heat of cast iron", 420, "J/(kg·K)",
			"cast iron (≈ 4 % C): ρ 7272 kg/m³, cp 420 J/kg·K, k 52 W/m·K (property tables of metals at 20 °C in heat-transfer data books; values from memory, no table named)"),
			Parameter.fromMemory("ε,ci", "emissivity of a seasoned cast-iron pan", 0.8, "–",
					"oxidised or seasoned iron 0.6–0.9 (radiation tables of heat-transfer handbooks; value from memory)")),
	CARBON_STEEL("carbon steel", Parameter.published("cp,cs", "specific heat of plain carbon steel", 434, "J/(kg·K)",
			"plain carbon steel: ρ 7854 kg/m³, cp 434 J/kg·K, k 60.5 W/m·K (Incropera, Fundamentals of Heat and Mass Transfer, Table A.1)"),
			Parameter.fromMemory("ε,cs", "emissivity of a seasoned carbon-steel pan", 0.8, "–",
					"oxidised or seasoned steel 0.6–0.9 (radiation tables of heat-transfer handbooks; value from memory)")),
	CLAD_STAINLESS("clad stainless steel", Parameter.assumption("cp,ss", "specific heat of a clad stainless pan", 477,
			"J/(kg·K)",
			"AISI 304: ρ 7900 kg/m³, cp 477 J/kg·K, k 14.9 W/m·K (Incropera, Table A.1, from memory); the aluminium core is not counted (assumption: it raises cp by up to a third)")),
	ALUMINIUM("aluminium", Parameter.published("cp,al", "specific heat of aluminium", 903, "J/(kg·K)",
			"pure aluminium: ρ 2702 kg/m³, cp 903 J/kg·K, k 237 W/m·K (Incropera, Fundamentals of Heat and Mass Transfer, Table A.1)"),
			Parameter.fromMemory("ε,al", "emissivity of an aluminium pan", 0.2, "–",
					"bare aluminium 0.05–0.3, more when anodised or soiled (radiation tables of heat-transfer handbooks; value from memory)"));

	private static final Parameter POLISHED_STAINLESS_EMISSIVITY = Parameter.fromMemory("ε,ss",
			"emissivity of a stainless pan", 0.3, "–",
			"stainless steel 0.1–0.4, more when discoloured by heat (radiation tables of heat-transfer handbooks; value from memory)");

	private final String label;

	private final Parameter specificHeat;

	private final Parameter emissivity;

	PanMaterial(String label, Parameter specificHeat, Parameter emissivity) {
		this.label = label;
		this.specificHeat = specificHeat;
		this.emissivity = emissivity;
	}

	PanMaterial(String label, Parameter specificHeat) {
		this(label, specificHeat, null);
	}

	public String label() {
		return label;
	}

	public Parameter specificHeat() {
		return specificHeat;
	}

	public Parameter emissivity() {
		return emissivity != null ? emissivity : POLISHED_STAINLESS_EMISSIVITY;
	}

	/**
	 * A key for the API and forms: cast-iron, carbon-steel, clad-stainless, aluminium.
	 */
	public String key() {
		return name().toLowerCase().replace('_', '-');
	}

}
